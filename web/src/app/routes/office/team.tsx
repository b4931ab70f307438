import { PageHeader } from '@/components/page-header';
import { TeamTable } from '@/features/team/components/team-table';

export function Component() {
  return (
    <>
      <PageHeader title="Team" subtitle="Everyone who signs in to your organisation, and their role." />
      <TeamTable />
    </>
  );
}
