import Box from '@mui/material/Box';
import Tab from '@mui/material/Tab';
import Tabs from '@mui/material/Tabs';
import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { BillingTermsForm } from '@/features/price-list/components/billing-terms-form';
import { LabourRatesCard } from '@/features/price-list/components/labour-rates-card';
import { PriceListTable } from '@/features/price-list/components/price-list-table';
import { VatRatesCard } from '@/features/price-list/components/vat-rates-card';

const TABS = [
  { key: 'items', label: 'Price list' },
  { key: 'rates', label: 'VAT and labour rates' },
  { key: 'terms', label: 'Terms' },
] as const;

export function Component() {
  const [params, setParams] = useSearchParams();
  const tab = TABS.find((t) => t.key === params.get('tab'))?.key ?? 'items';
  return (
    <>
      <PageHeader title="Price list" subtitle="What you charge: parts, labour, VAT, and the terms every quote and invoice starts with." />
      <Tabs variant="scrollable" scrollButtons="auto" value={tab} onChange={(_, key: string) => setParams(key === 'items' ? {} : { tab: key }, { replace: true })} aria-label="Price list sections" sx={{ mb: 2, borderBottom: 1, borderColor: 'divider' }}>
        {TABS.map((t) => (
          <Tab key={t.key} value={t.key} label={t.label} id={`pricing-tab-${t.key}`} aria-controls={`pricing-panel-${t.key}`} />
        ))}
      </Tabs>
      <Box role="tabpanel" id={`pricing-panel-${tab}`} aria-labelledby={`pricing-tab-${tab}`}>
        {tab === 'items' && <PriceListTable />}
        {tab === 'rates' && (
          // Side by side only where both fit whole; one above the other at 1280 px.
          <Box sx={{ display: 'grid', gap: 2, alignItems: 'start', gridTemplateColumns: 'minmax(0, 1fr)', '@media (min-width: 1400px)': { gridTemplateColumns: 'repeat(2, minmax(0, 1fr))' } }}>
            <VatRatesCard />
            <LabourRatesCard />
          </Box>
        )}
        {tab === 'terms' && <BillingTermsForm />}
      </Box>
    </>
  );
}
