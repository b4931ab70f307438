import ArrowBack from '@mui/icons-material/ArrowBack';
import EventBusyOutlined from '@mui/icons-material/EventBusyOutlined';
import PlaceOutlined from '@mui/icons-material/PlaceOutlined';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Divider from '@mui/material/Divider';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { VisitTrail } from '@/features/photos/components/visit-trail';
import { useVisit } from '@/features/visits/api/get-visit';
import { siteAddress } from '@/features/visits/components/visit-card';
import { VisitCircuits } from '@/features/visits/components/visit-circuits';
import { VisitNotes } from '@/features/visits/components/visit-notes';
import { dayLabel, timeWindow, visitStatusWords } from '@/features/visits/visit-format';
import { useSession } from '@/lib/session';

function BackToToday() {
  return (
    <Button component={RouterLink} to={paths.today.path} startIcon={<ArrowBack />} sx={{ ml: -1.5, mb: 1 }}>
      Today
    </Button>
  );
}

export function Component() {
  const { visitId } = useParams();
  const summary = useVisit(visitId);
  const userId = useSession()?.user.id ?? '';
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
  const { visit, job, customer } = summary;
  return (
    <>
      <BackToToday />
      <PageHeader
        title={job?.title ?? 'Visit'}
        subtitle={
          <Stack component="span" direction="row" sx={{ gap: 0.5, alignItems: 'flex-start' }}>
            <PlaceOutlined fontSize="small" sx={{ mt: '2px' }} />
            <span>{siteAddress(summary)}</span>
          </Stack>
        }
      />
      <Stack direction="row" sx={{ gap: 1, alignItems: 'center', flexWrap: 'wrap', mt: -1.5, mb: 2 }}>
        <Typography variant="body2" sx={{ fontWeight: 500 }}>
          {visit.plannedStart ? `${dayLabel(visit.plannedStart)} · ` : ''}
          {timeWindow(visit.plannedStart, visit.plannedEnd)}
        </Typography>
        <Chip size="small" label={visitStatusWords(visit.status)} />
        {customer && (
          <Typography variant="body2" color="text.secondary">
            {customer.name}
            {customer.phone ? ` · ${customer.phone}` : ''}
          </Typography>
        )}
      </Stack>
      {summary.site?.accessNotes && (
        <Typography variant="body2" sx={{ mb: 2 }}>
          <strong>Access:</strong> {summary.site.accessNotes}
        </Typography>
      )}
      <Stack spacing={3} divider={<Divider flexItem />}>
        <VisitTrail visit={visit} userId={userId} />
        <VisitNotes visitId={visit.id} siteId={visit.siteId} />
        <VisitCircuits siteId={visit.siteId} />
      </Stack>
    </>
  );
}
