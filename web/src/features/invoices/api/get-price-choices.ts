import { useQuery } from '@tanstack/react-query';
import { labourRatesQueryOptions } from '@/lib/labour-rates';
import { priceItemsQueryOptions } from '@/lib/price-list';

/** What the line editor offers to add: the price list's items and the labour rates that are still offered. */
export function usePriceChoices() {
  const items = useQuery(priceItemsQueryOptions());
  const labour = useQuery(labourRatesQueryOptions());
  return {
    items: (items.data?.items ?? []).filter((i) => i.active !== false),
    labour: (labour.data?.items ?? []).filter((l) => l.active),
  };
}
