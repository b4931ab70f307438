import ArrowBack from '@mui/icons-material/ArrowBack';
import DirectionsOutlined from '@mui/icons-material/DirectionsOutlined';
import EventBusyOutlined from '@mui/icons-material/EventBusyOutlined';
import LockOutlined from '@mui/icons-material/LockOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { FINISHED_VISIT_STATUS } from '@wiretrail/core';
import { Outlet, Link as RouterLink, useParams } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { paths } from '@/config/paths';
import { useVisit } from '@/features/visits/data/get-visit';
import { directionsHref, siteAddress } from '@/features/visits/phone/visit-card';
import { useVisitSection, VisitSections } from '@/features/visits/phone/visit-sections';
import { dayLabel, timeWindow, visitStatusWords, whenSigned } from '@/features/visits/visit-format';
import { useSession } from '@/lib/session';
import type { VisitContext } from './visit-context';

function BackToToday() {
  return (
    <Button component={RouterLink} to={paths.today.path} startIcon={<ArrowBack />} sx={{ ml: -1.5, mb: 0.5 }}>
      Today
    </Button>
  );
}

/** One visit: who, where and when at the top, then its sections. */
export function Component() {
  const { visitId } = useParams();
  const summary = useVisit(visitId);
  const session = useSession();
  // Who, where and when are read on arrival; inside a section they would only push the work down the screen.
  const full = useVisitSection(visitId ?? '') === 'trail';
  if (summary === undefined) return null;
  if (summary === null) {
    return (
      <>
        <BackToToday />
        <EmptyState icon={<EventBusyOutlined />} title="This visit is not on this phone">
          It may have been moved to someone else, or not fetched yet. It appears here after the next sync if it is yours.
        </EmptyState>
      </>
    );
  }
  const { visit, job, customer, site } = summary;
  const locked = visit.status === FINISHED_VISIT_STATUS;
  const context: VisitContext = { summary, userId: session?.user.id ?? '', userName: session?.user.name ?? '', locked };
  return (
    <>
      <BackToToday />
      <Typography variant="h1" sx={{ fontSize: '1.45rem' }}>
        {job?.title ?? 'Visit'}
      </Typography>
      {full && (
        <>
          <Stack direction="row" sx={{ gap: 1, alignItems: 'center', flexWrap: 'wrap', mt: 0.75 }}>
            <Typography variant="body2" sx={{ fontWeight: 500 }}>
              {visit.plannedStart ? `${dayLabel(visit.plannedStart)} · ` : ''}
              {timeWindow(visit.plannedStart, visit.plannedEnd)}
            </Typography>
            <Chip size="small" label={visitStatusWords(visit.status)} color={visit.status === 'on-site' ? 'secondary' : 'default'} />
            {customer && (
              <Typography variant="body2" color="text.secondary">
                {customer.name}
                {customer.phone ? ` · ${customer.phone}` : ''}
              </Typography>
            )}
          </Stack>
          <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between', gap: 1, mt: 0.5 }}>
            <Typography variant="body2" color="text.secondary">
              {siteAddress(summary)}
            </Typography>
            {site && (
              <Button component="a" href={directionsHref(site)} target="_blank" rel="noopener" startIcon={<DirectionsOutlined />} sx={{ flexShrink: 0 }}>
                Directions
              </Button>
            )}
          </Stack>
          {site?.accessNotes && (
            <Typography variant="body2" sx={{ mt: 0.5 }}>
              <strong>Access:</strong> {site.accessNotes}
            </Typography>
          )}
        </>
      )}
      {locked && (
        <Alert icon={<LockOutlined />} severity="info" sx={{ mt: 1.5 }}>
          Signed off {visit.signedAt ? whenSigned(visit.signedAt) : ''}
          {visit.signedByName ? ` by ${visit.signedByName}` : ''}. The records are locked; a change made now goes to the office for review.
        </Alert>
      )}
      <Stack sx={{ mt: 1.5 }}>
        <VisitSections visitId={visit.id} />
      </Stack>
      <Outlet context={context} />
    </>
  );
}
