import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { NewJobDialog } from '@/features/jobs/components/new-job-dialog';
import { CustomersAndSites } from '@/features/sites/components/customers-and-sites';

export function Component() {
  const navigate = useNavigate();
  const [newJobFor, setNewJobFor] = useState<{ customerId: string; siteId?: string } | null>(null);
  return (
    <>
      <PageHeader title="Customers & sites" subtitle="Who you work for, where, and what each site's installation holds." />
      <CustomersAndSites onNewJob={(customerId, siteId) => setNewJobFor({ customerId, siteId })} />
      {newJobFor && <NewJobDialog {...newJobFor} onClose={() => setNewJobFor(null)} onCreated={(job) => navigate(paths.job.href(job.id))} />}
    </>
  );
}
