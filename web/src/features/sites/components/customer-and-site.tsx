import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Skeleton from '@mui/material/Skeleton';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useCustomer } from '../api/get-customers';
import { useSite } from '../api/get-sites';
import { Fact } from './site-supply';

/** Who a job is for and where: contact details, the address, the supply and the access notes, side by side. */
export function CustomerAndSite({ customerId, siteId }: { customerId: string; siteId: string }) {
  const customer = useCustomer(customerId);
  const site = useSite(siteId);
  if (customer.isError) return <Alert severity="error">{customer.error.message}</Alert>;
  if (site.isError) return <Alert severity="error">{site.error.message}</Alert>;
  const c = customer.data;
  const s = site.data;
  return (
    <Paper variant="outlined" component="section" aria-label="Customer and site" sx={{ p: 2 }}>
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: '1fr 1fr 1.4fr' }, gap: 3 }}>
        <Stack spacing={0.5}>
          <Typography variant="overline" color="text.secondary">
            Customer
          </Typography>
          {c ? (
            <>
              <Typography variant="h3">{c.name}</Typography>
              {c.phone && <Typography>{c.phone}</Typography>}
              {c.email && (
                <Link href={`mailto:${c.email}`} underline="hover">
                  {c.email}
                </Link>
              )}
            </>
          ) : (
            <Skeleton width="60%" />
          )}
        </Stack>
        <Stack spacing={0.5}>
          <Typography variant="overline" color="text.secondary">
            Site
          </Typography>
          {s ? (
            <>
              <Link component={RouterLink} to={paths.site.href(s.id)} underline="hover" sx={{ fontWeight: 500, fontSize: '1.125rem' }}>
                {s.name ?? s.address}
              </Link>
              <Typography>
                {s.address}
                {s.postcode ? `, ${s.postcode}` : ''}
              </Typography>
            </>
          ) : (
            <Skeleton width="60%" />
          )}
        </Stack>
        {s && (
          <Box sx={{ display: 'grid', gridTemplateColumns: 'repeat(3, auto)', gap: 2, alignContent: 'start' }}>
            <Fact label="Earthing">{s.earthing ?? 'Not recorded'}</Fact>
            <Fact label="Ze">{s.zeOhm != null ? `${s.zeOhm} Ω` : 'Not recorded'}</Fact>
            <Fact label="PFC">{s.pfcKa != null ? `${s.pfcKa} kA` : 'Not recorded'}</Fact>
            <Box sx={{ gridColumn: '1 / -1' }}>
              <Fact label="Access notes">{s.accessNotes ?? 'None'}</Fact>
            </Box>
          </Box>
        )}
      </Box>
    </Paper>
  );
}
