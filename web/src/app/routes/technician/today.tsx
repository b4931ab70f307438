import EventAvailableOutlined from '@mui/icons-material/EventAvailableOutlined';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { useSession } from '@/lib/session';

const dateFormat = new Intl.DateTimeFormat('en-GB', { weekday: 'long', day: 'numeric', month: 'long' });

export function Component() {
  const session = useSession();
  const firstName = session?.user.name.split(' ')[0];
  return (
    <>
      <PageHeader title="Today" subtitle={`${dateFormat.format(new Date())} · ${firstName}`} />
      <EmptyState icon={<EventAvailableOutlined />} title="No visits booked for you">
        Visits the office books for you in the next seven days appear here, and stay on this phone when there is no signal.
      </EmptyState>
    </>
  );
}
