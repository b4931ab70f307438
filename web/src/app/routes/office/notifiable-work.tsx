import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { NOTIFIABLE_FILTERS, type NotifiableFilter } from '@/features/notifiable-work/api/get-notifiable-work';
import { NotifiableWorkList } from '@/features/notifiable-work/components/notifiable-work-list';
import { useSession } from '@/lib/session';

export function Component() {
  const [params, setParams] = useSearchParams();
  const session = useSession();
  const asked = params.get('state');
  const filter: NotifiableFilter = (NOTIFIABLE_FILTERS as readonly string[]).includes(asked ?? '') ? (asked as NotifiableFilter) : 'all';
  return (
    <>
      <PageHeader title="Notifications" subtitle="New circuits and replaced consumer units to notify under the Building Regulations, overdue first." />
      <NotifiableWorkList
        adminOf={session?.user.role === 'admin' ? session.user.organisationId : undefined}
        jobHref={(jobId) => paths.job.href(jobId)} filter={filter} onFilter={(f) => setParams(f === 'all' ? {} : { state: f }, { replace: true })} />
    </>
  );
}
