import Alert from '@mui/material/Alert';
import { useLocation } from 'react-router-dom';
import { CableList } from '@/features/cables/phone/cable-list';
import { TracingCaution } from '@/features/cables/phone/tracing-caution';
import { useVisitContext } from '../visit-context';

export function Component() {
  const { summary, locked } = useVisitContext();
  const saved = (useLocation().state as { saved?: string } | null)?.saved;
  return (
    <>
      {saved && (
        <Alert severity="success" sx={{ mb: 2 }} role="status">
          Cable {saved} saved on this phone.
        </Alert>
      )}
      <TracingCaution />
      <CableList siteId={summary.visit.siteId} visitId={summary.visit.id} locked={locked} />
    </>
  );
}
