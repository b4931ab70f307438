import { CircuitList } from '@/features/circuits/phone/circuit-list';
import { CautionGate } from '@/features/visits/phone/caution-gate';
import { useVisitContext } from '../visit-context';

export function Component() {
  const { summary, locked } = useVisitContext();
  return (
    <CautionGate visit={summary.visit} locked={locked}>
      <CircuitList visitId={summary.visit.id} siteId={summary.visit.siteId} locked={locked} />
    </CautionGate>
  );
}
