import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RowOf } from '@wiretrail/core';
import { api } from './api-client';

/** A line of the price list: a synced row, so it carries its version. Prices in pence before VAT. */
export type PriceItem = RowOf<'priceItem'> & { version: number };

/** The whole list at once (a contractor's price list is a few hundred lines at most): the price list screen keeps it, invoices pick from it. */
export const priceItemsQueryOptions = () =>
  queryOptions({
    queryKey: ['price-items', { pageSize: 200 }],
    queryFn: ({ signal }) => api.get<{ items: PriceItem[]; total: number }>('/price-items?pageSize=200', signal),
  });

export function usePriceItems() {
  return useQuery(priceItemsQueryOptions());
}
