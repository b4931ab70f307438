import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { CircuitPhotos } from '@/features/photos/components/circuit-photos';
import { useSite } from '@/features/sites/api/get-sites';
import { SiteCircuits } from '@/features/sites/components/site-circuits';
import { useDirectory } from '@/lib/directory';

export function Component() {
  const { siteId = '' } = useParams();
  const site = useSite(siteId);
  const directory = useDirectory();
  const personName = (userId: string) => directory.data?.find((u) => u.id === userId)?.name ?? null;
  if (site.isPending) return <LinearProgress aria-label="Loading the site" />;
  if (site.isError) return <Alert severity="error">{site.error.message}</Alert>;
  const s = site.data;
  return (
    <>
      <PageHeader
        title={s.name ?? s.address}
        subtitle={`${s.address}${s.postcode ? `, ${s.postcode}` : ''} · ${s.earthing ?? 'earthing not recorded'}${s.zeOhm != null ? ` · Ze ${s.zeOhm} Ω` : ''}`}
        action={
          <Button component={RouterLink} to={paths.customers.path}>
            All sites
          </Button>
        }
      />
      {s.accessNotes && (
        <Alert severity="info" sx={{ mb: 2 }}>
          {s.accessNotes}
        </Alert>
      )}
      <Typography variant="h2" sx={{ mb: 1.5 }}>
        Circuits
      </Typography>
      <SiteCircuits siteId={siteId} photos={(c, label) => <CircuitPhotos circuitId={c.id} circuitLabel={label} personName={personName} />} />
    </>
  );
}
