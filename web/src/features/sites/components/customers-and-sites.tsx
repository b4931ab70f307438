import Alert from '@mui/material/Alert';
import LinearProgress from '@mui/material/LinearProgress';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useCustomers } from '../api/get-customers';
import { useSites } from '../api/get-sites';

/** Every site with its customer: where the work is, who pays, and what the supply is. */
export function CustomersAndSites() {
  const customers = useCustomers();
  const sites = useSites();
  if (customers.isPending || sites.isPending) return <LinearProgress aria-label="Loading customers and sites" />;
  if (customers.isError) return <Alert severity="error">{customers.error.message}</Alert>;
  if (sites.isError) return <Alert severity="error">{sites.error.message}</Alert>;
  const customerName = new Map(customers.data.items.map((c) => [c.id, c.name]));
  return (
    <TableContainer component={Paper} variant="outlined">
      <Table aria-label="Sites">
        <TableHead>
          <TableRow>
            <TableCell>Site</TableCell>
            <TableCell>Customer</TableCell>
            <TableCell>Earthing</TableCell>
            <TableCell align="right">Ze (Ω)</TableCell>
            <TableCell align="right">PFC (kA)</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {sites.data.items.map((s) => (
            <TableRow key={s.id} hover>
              <TableCell>
                <Link component={RouterLink} to={paths.site.href(s.id)} underline="hover">
                  {s.name ?? s.address}
                </Link>
                <br />
                {s.address}
                {s.postcode ? `, ${s.postcode}` : ''}
              </TableCell>
              <TableCell>{customerName.get(s.customerId) ?? '—'}</TableCell>
              <TableCell>{s.earthing ?? '—'}</TableCell>
              <TableCell align="right">{s.zeOhm ?? '—'}</TableCell>
              <TableCell align="right">{s.pfcKa ?? '—'}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
