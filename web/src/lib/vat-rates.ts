import { queryOptions, useQuery } from '@tanstack/react-query';
import { formatRate } from '@wiretrail/core';
import { api } from './api-client';

/** One of the organisation's VAT rates, as the price list and every invoice line name it. */
export interface VatRate {
  id: string;
  code: string;
  name: string;
  /** Hundredths of a per cent: 2000 is 20 %. */
  basisPoints: number;
  active: boolean;
}

/** Shared by the price list and the invoices: both offer the organisation's rates. */
export const vatRatesQueryOptions = () =>
  queryOptions({
    queryKey: ['vat-rates'],
    queryFn: ({ signal }) => api.get<{ items: VatRate[] }>('/vat-rates', signal),
    staleTime: 5 * 60_000,
  });

export function useVatRates() {
  return useQuery(vatRatesQueryOptions());
}

/** "Standard rate (20 %)". */
export const vatRateLabel = (r: Pick<VatRate, 'name' | 'basisPoints'>) => `${r.name} (${formatRate(r.basisPoints)})`;
