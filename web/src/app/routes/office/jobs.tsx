import ViewKanbanOutlined from '@mui/icons-material/ViewKanbanOutlined';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export function Component() {
  return (
    <>
      <PageHeader title="Jobs" subtitle="Every job from enquiry to paperwork, by stage." />
      <EmptyState icon={<ViewKanbanOutlined />} title="No jobs yet">
        Jobs you book appear here on a board by stage, with a table view for searching and filtering.
      </EmptyState>
    </>
  );
}
