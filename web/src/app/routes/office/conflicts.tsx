import { PageHeader } from '@/components/page-header';
import { ConflictsInbox } from '@/features/conflicts/components/conflicts-inbox';

export function Component() {
  return (
    <>
      <PageHeader title="Conflicts" subtitle="Values that two people changed at once, side by side, for you to settle." />
      <ConflictsInbox />
    </>
  );
}
