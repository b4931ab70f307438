import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { DeskSiteMap } from '@/features/hidden-routes/desk/desk-site-map';
import { useSite } from '@/features/sites/api/get-sites';

export function Component() {
  const { siteId = '' } = useParams();
  const site = useSite(siteId);
  if (site.isPending) return <LinearProgress aria-label="Loading the site" />;
  if (site.isError) return <Alert severity="error">{site.error.message}</Alert>;
  const s = site.data;
  return (
    <>
      <PageHeader
        title={`Hidden routes: ${s.name ?? s.address}`}
        subtitle="Where cables run behind the finished surfaces, as marked on photos before they were covered"
        action={
          <Button component={RouterLink} to={paths.site.href(siteId)}>
            Back to the site
          </Button>
        }
      />
      <DeskSiteMap siteId={siteId} />
    </>
  );
}
