import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from './api-client';

/** What an hour of labour is charged at: the price list screen keeps these, invoices price labour with them. */
export interface LabourRate {
  id: string;
  name: string;
  /** Pence per hour before VAT. */
  hourlyMinor: number;
  vatRateCode: string;
  active: boolean;
  isDefault: boolean;
}

export const labourRatesQueryOptions = () =>
  queryOptions({
    queryKey: ['labour-rates'],
    queryFn: ({ signal }) => api.get<{ items: LabourRate[] }>('/labour-rates', signal),
  });

export function useLabourRates() {
  return useQuery(labourRatesQueryOptions());
}
