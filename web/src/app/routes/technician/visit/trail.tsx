import { VisitTrail } from '@/features/photos/phone/visit-trail';
import { QuickNote } from '@/features/visits/phone/quick-note';
import { useVisitContext } from '../visit-context';

export function Component() {
  const { summary, userId, locked } = useVisitContext();
  const { visit } = summary;
  return <VisitTrail visit={visit} userId={userId} locked={locked} extra={<QuickNote visitId={visit.id} siteId={visit.siteId} />} />;
}
