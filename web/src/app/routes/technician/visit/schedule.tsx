import { BoardSchedule } from '@/features/circuits/phone/board-schedule';
import { CautionGate } from '@/features/visits/phone/caution-gate';
import { useVisitContext } from '../visit-context';

export function Component() {
  const { summary, locked } = useVisitContext();
  return (
    <CautionGate visit={summary.visit} locked={locked}>
      <BoardSchedule visitId={summary.visit.id} siteId={summary.visit.siteId} />
    </CautionGate>
  );
}
