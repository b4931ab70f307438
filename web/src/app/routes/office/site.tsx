import EditOutlined from '@mui/icons-material/EditOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
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
          <Stack direction="row" spacing={1}>
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
      {editing && <SiteDialog site={s} customers={customers.data?.items ?? []} onClose={() => setEditing(false)} />}
    </>
  );
}
