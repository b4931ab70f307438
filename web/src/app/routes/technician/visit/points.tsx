import Alert from '@mui/material/Alert';
import { useLocation } from 'react-router-dom';
import { PointList } from '@/features/points/phone/point-list';
import { CautionGate } from '@/features/visits/phone/caution-gate';
import { useVisitContext } from '../visit-context';

export function Component() {
  const { summary, locked } = useVisitContext();
  const saved = (useLocation().state as { saved?: boolean } | null)?.saved;
  return (
    <CautionGate visit={summary.visit} locked={locked}>
      {saved && (
        <Alert severity="success" sx={{ mb: 2 }} role="status">
          Point change saved on this phone.
        </Alert>
      )}
      <PointList visitId={summary.visit.id} siteId={summary.visit.siteId} locked={locked} />
    </CautionGate>
  );
}
