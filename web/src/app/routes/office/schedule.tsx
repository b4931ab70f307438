import CalendarMonthOutlined from '@mui/icons-material/CalendarMonthOutlined';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export function Component() {
  return (
    <>
      <PageHeader title="Schedule" subtitle="Visits for the week, per technician." />
      <EmptyState icon={<CalendarMonthOutlined />} title="Nothing scheduled">
        Visits you book and assign show here by technician and day; technicians receive them on their next sync.
      </EmptyState>
    </>
  );
}
