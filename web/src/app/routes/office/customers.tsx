import HomeWorkOutlined from '@mui/icons-material/HomeWorkOutlined';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export function Component() {
  return (
    <>
      <PageHeader title="Customers & sites" subtitle="Who you work for, where, and what each site's installation holds." />
      <EmptyState icon={<HomeWorkOutlined />} title="No customers yet">
        Customers and their sites (address, earthing arrangement, Ze, boards and circuits) are kept here.
      </EmptyState>
    </>
  );
}
