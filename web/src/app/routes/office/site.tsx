import EditOutlined from '@mui/icons-material/EditOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { Link as RouterLink, useNavigate, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { NewJobDialog } from '@/features/jobs/components/new-job-dialog';
import { CircuitPhotos } from '@/features/photos/desk/circuit-photos';
import { useCustomers } from '@/features/sites/api/get-customers';
import { useSite } from '@/features/sites/api/get-sites';
import { SiteDialog } from '@/features/sites/components/forms/site-dialog';
import { SiteAreasAndBoards } from '@/features/sites/components/site-areas-and-boards';
import { SiteCircuits } from '@/features/sites/components/site-circuits';
import { SiteSupply } from '@/features/sites/components/site-supply';
import { useDirectory } from '@/lib/directory';

export function Component() {
  const { siteId = '' } = useParams();
  const site = useSite(siteId);
  const customers = useCustomers();
  const directory = useDirectory();
  const [editing, setEditing] = useState(false);
  const [taking, setTaking] = useState(false);
  const navigate = useNavigate();
  const personName = (userId: string) => directory.data?.find((u) => u.id === userId)?.name ?? null;
  if (site.isPending) return <LinearProgress aria-label="Loading the site" />;
  if (site.isError) return <Alert severity="error">{site.error.message}</Alert>;
  const s = site.data;
  return (
    <>
      <PageHeader
        title={s.name ?? s.address}
        subtitle={`${s.address}${s.postcode ? `, ${s.postcode}` : ''}${s.customerName ? ` · for ${s.customerName}` : ''}`}
        action={
          <Stack direction="row" sx={{ gap: 1, flexWrap: 'wrap' }}>
            <Button variant="contained" onClick={() => setTaking(true)}>
              New job here
            </Button>
            <Button variant="outlined" component={RouterLink} to={paths.siteHiddenRoutes.href(siteId)}>
              Hidden routes
            </Button>
            <Button variant="outlined" startIcon={<EditOutlined />} onClick={() => setEditing(true)}>
              Change site details
            </Button>
            <Button component={RouterLink} to={paths.customers.path}>
              All sites
            </Button>
          </Stack>
        }
      />
      <Stack spacing={3}>
        <SiteSupply site={s} />
        <SiteAreasAndBoards siteId={siteId} />
        <SiteCircuits
          siteId={siteId}
          title="Circuits"
          editable
          extra={{ header: 'Photos', render: (c, label) => <CircuitPhotos circuitId={c.id} circuitLabel={label} personName={personName} /> }}
        />
      </Stack>
      {taking && <NewJobDialog customerId={s.customerId} siteId={s.id} onClose={() => setTaking(false)} onCreated={(job) => navigate(paths.job.href(job.id))} />}
      {editing && <SiteDialog site={s} customers={customers.data?.items ?? []} onClose={() => setEditing(false)} />}
    </>
  );
}
