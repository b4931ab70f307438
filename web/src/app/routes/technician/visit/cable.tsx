import ArrowBack from '@mui/icons-material/ArrowBack';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, useNavigate, useParams } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { paths } from '@/config/paths';
import { useCable, useSiteCables } from '@/features/cables/data/get-site-cables';
import { CableForm } from '@/features/cables/phone/cable-form';
import { TracingCaution } from '@/features/cables/phone/tracing-caution';
import { TraceLog } from '@/features/cables/phone/trace-log';
import SpeedOutlined from '@mui/icons-material/SpeedOutlined';
import Divider from '@mui/material/Divider';
import Stack from '@mui/material/Stack';
import CableOutlined from '@mui/icons-material/CableOutlined';
import { useVisitContext } from '../visit-context';

export function Component() {
  const { summary, locked } = useVisitContext();
  const { cableId = 'new' } = useParams();
  const navigate = useNavigate();
  const isNew = cableId === 'new';
  const cable = useCable(isNew ? undefined : cableId);
  const site = useSiteCables(summary.visit.siteId);
  const back = paths.visitCables.href(summary.visit.id);
  if (!site || (!isNew && cable === undefined)) return null;
  return (
    <>
      <Button component={RouterLink} to={back} startIcon={<ArrowBack />} sx={{ ml: -1.5, mb: 1 }}>
        All cables
      </Button>
      {!isNew && !cable ? (
        <EmptyState icon={<CableOutlined />} title="This cable is not on this phone">
          It may belong to another site, or not have reached this phone yet.
        </EmptyState>
      ) : (
        <>
          <Typography variant="h2" sx={{ mb: 2 }}>
            {isNew ? 'Record a cable' : `Cable ${cable!.label}`}
          </Typography>
          <TracingCaution />
          <CableForm
            key={cable?.id ?? 'new'}
            siteId={summary.visit.siteId}
            visitId={summary.visit.id}
            cable={isNew ? null : cable!}
            areas={site.areas}
            locked={locked}
            onSaved={(_id, label) => navigate(back, { state: { saved: label } })}
          />
          {cable && (
            <Stack spacing={2} sx={{ mt: 3 }}>
              <Divider />
              <Button component={RouterLink} to={paths.visitCableResults.href(summary.visit.id, cable.id)} variant="outlined" size="large" startIcon={<SpeedOutlined />}>
                Performance results
              </Button>
              <TraceLog cable={cable} visit={summary.visit} locked={locked} />
            </Stack>
          )}
        </>
      )}
    </>
  );
}
