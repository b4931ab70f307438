import { PageHeader } from '@/components/page-header';
import { ScheduleWeek } from '@/features/schedule/components/schedule-week';

export function Component() {
  return (
    <>
      <PageHeader title="Schedule" subtitle="Visits for the week, per technician. Phones receive changes on their next sync." />
      <ScheduleWeek />
    </>
  );
}
