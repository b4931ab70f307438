import EventAvailableOutlined from '@mui/icons-material/EventAvailableOutlined';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { useUpcomingVisits } from '@/features/visits/data/get-upcoming-visits';
import { VisitCard } from '@/features/visits/phone/visit-card';
import { useSession } from '@/lib/session';
import { useSyncStatus } from '@/lib/sync/use-sync-status';

const dateFormat = new Intl.DateTimeFormat('en-GB', { weekday: 'long', day: 'numeric', month: 'long' });

export function Component() {
  const session = useSession();
  const firstName = session?.user.name.split(' ')[0];
  const visits = useUpcomingVisits(session?.user.id);
  const sync = useSyncStatus();
  return (
    <>
      <PageHeader title="Today" subtitle={`${dateFormat.format(new Date())} · ${firstName}`} />
      {visits === undefined ? null : visits.length > 0 ? (
        <Stack spacing={1.5} component="section" aria-label="My visits">
          {visits.map((s) => (
            <VisitCard key={s.visit.id} summary={s} />
          ))}
        </Stack>
      ) : (
        <EmptyState icon={<EventAvailableOutlined />} title={!sync.lastSyncAt && sync.syncing ? 'Fetching your visits…' : 'No visits booked for you'}>
          Visits the office books for you in the next seven days appear here, and stay on this phone when there is no signal.
        </EmptyState>
      )}
      {visits && visits.length > 0 && (
        <Typography variant="body2" color="text.secondary" sx={{ mt: 2, textAlign: 'center' }}>
          Today and the next seven days. Everything here stays on this phone when there is no signal.
        </Typography>
      )}
    </>
  );
}
