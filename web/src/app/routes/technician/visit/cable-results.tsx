import ArrowBack from '@mui/icons-material/ArrowBack';
import CableOutlined from '@mui/icons-material/CableOutlined';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, useNavigate, useParams } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { paths } from '@/config/paths';
import { useCable } from '@/features/cables/data/get-site-cables';
import { LinkTestPage } from '@/features/cables/phone/link-test-page';
import { useVisitContext } from '../visit-context';

export function Component() {
  const { summary, locked } = useVisitContext();
  const { cableId = '' } = useParams();
  const navigate = useNavigate();
  const cable = useCable(cableId);
  const back = paths.visitCable.href(summary.visit.id, cableId);
  if (cable === undefined) return null;
  return (
    <>
      <Button component={RouterLink} to={back} startIcon={<ArrowBack />} sx={{ ml: -1.5, mb: 1 }}>
        {cable ? `Cable ${cable.label}` : 'Back'}
      </Button>
      {!cable ? (
        <EmptyState icon={<CableOutlined />} title="This cable is not on this phone">
          It may belong to another site, or not have reached this phone yet.
        </EmptyState>
      ) : (
        <>
          <Typography variant="h2" sx={{ mb: 2 }}>
            Performance results of {cable.label}
          </Typography>
          <LinkTestPage cable={cable} visitId={summary.visit.id} locked={locked} onSaved={() => navigate(paths.visitCables.href(summary.visit.id), { state: { saved: `${cable.label} (performance results)` } })} />
        </>
      )}
    </>
  );
}
