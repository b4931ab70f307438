import ArrowBack from '@mui/icons-material/ArrowBack';
import Alert from '@mui/material/Alert';
import PowerOutlined from '@mui/icons-material/PowerOutlined';
import Button from '@mui/material/Button';
import Divider from '@mui/material/Divider';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink, useLocation, useNavigate, useParams } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { paths } from '@/config/paths';
import { PhotoCapture } from '@/features/photos/phone/photo-capture';
import { usePointChange, useVisitPoints } from '@/features/points/data/get-visit-points';
import { PointForm } from '@/features/points/phone/point-form';
import { CautionGate } from '@/features/visits/phone/caution-gate';
import { useVisitContext } from '../visit-context';

export function Component() {
  const { summary, locked, userId } = useVisitContext();
  const { visit } = summary;
  const { pointId = 'new' } = useParams();
  const navigate = useNavigate();
  const isNew = pointId === 'new';
  const data = useVisitPoints(visit.id, visit.siteId);
  const point = usePointChange(isNew ? null : pointId);
  const back = paths.visitPoints.href(visit.id);
  // A new point change opens as itself once saved: say so here, as the list does after an edit.
  const justSaved = (useLocation().state as { saved?: boolean } | null)?.saved === true;
  const [dismissed, setDismissed] = useState(false);
  if (!data || point === undefined) return null;
  return (
    <CautionGate visit={visit} locked={locked}>
      <Button component={RouterLink} to={back} startIcon={<ArrowBack />} sx={{ ml: -1.5, mb: 1 }}>
        All point changes
      </Button>
      {!isNew && !point ? (
        <EmptyState icon={<PowerOutlined />} title="This point change is not on this phone">
          It may belong to another visit.
        </EmptyState>
      ) : (
        <Stack spacing={2}>
          <Typography variant="h2">{isNew ? 'Record a point change' : 'Point change'}</Typography>
          {justSaved && !isNew && !dismissed && (
            <Alert severity="success" role="status" onClose={() => setDismissed(true)}>
              Point change saved on this phone.
            </Alert>
          )}
          <PointForm
            key={point?.id ?? 'new'}
            visitId={visit.id}
            siteId={visit.siteId}
            point={point}
            circuits={data.circuits}
            areas={data.areas}
            ringBaselines={data.ringBaselines}
            site={data.site}
            locked={locked}
            onSaved={(id) => (isNew ? navigate(paths.visitPoint.href(visit.id, id), { replace: true, state: { saved: true } }) : navigate(back, { state: { saved: true } }))}
          />
          {point && (
            <>
              <Divider />
              <Typography variant="h3">Photos of this point</Typography>
              <PhotoCapture
                visitId={visit.id}
                siteId={visit.siteId}
                userId={userId}
                preset={{ subject: `pointChange:${point.id}`, areaId: point.toAreaId ?? point.fromAreaId ?? null, label: 'Photograph this point' }}
              />
            </>
          )}
        </Stack>
      )}
    </CautionGate>
  );
}
