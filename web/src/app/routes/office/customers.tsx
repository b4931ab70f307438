import { PageHeader } from '@/components/page-header';
import { CustomersAndSites } from '@/features/sites/components/customers-and-sites';

export function Component() {
  return (
    <>
      <PageHeader title="Customers & sites" subtitle="Who you work for, where, and what each site's installation holds." />
      <CustomersAndSites />
    </>
  );
}
