import CallSplitOutlined from '@mui/icons-material/CallSplitOutlined';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export function Component() {
  return (
    <>
      <PageHeader title="Conflicts" subtitle="Values that two people changed at once, for you to settle." />
      <EmptyState icon={<CallSplitOutlined />} title="Nothing to settle">
        When two people change the same detail before syncing, both values are kept and the pair appears here.
      </EmptyState>
    </>
  );
}
