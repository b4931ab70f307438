import AddBusinessOutlined from '@mui/icons-material/AddBusinessOutlined';
import AddHomeWorkOutlined from '@mui/icons-material/AddHomeWorkOutlined';
import EditOutlined from '@mui/icons-material/EditOutlined';
import PersonAddAltOutlined from '@mui/icons-material/PersonAddAltOutlined';
import PostAddOutlined from '@mui/icons-material/PostAddOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import IconButton from '@mui/material/IconButton';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Tab from '@mui/material/Tab';
import Tabs from '@mui/material/Tabs';
import TextField from '@mui/material/TextField';
import Tooltip from '@mui/material/Tooltip';
import Typography from '@mui/material/Typography';
import type { GridColDef, GridPaginationModel } from '@mui/x-data-grid';
import { useDeferredValue, useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { RecordGrid } from '@/components/record-grid';
import { paths } from '@/config/paths';
import { type Customer, useCustomers } from '../api/get-customers';
import { type Site, useSites } from '../api/get-sites';
import { CustomerDialog } from './forms/customer-dialog';
import { SiteDialog } from './forms/site-dialog';

type Editing = { kind: 'customer'; customer?: Customer } | { kind: 'site'; site?: Site; customerId?: string } | null;

const FIRST_PAGE: GridPaginationModel = { page: 0, pageSize: 25 };

/** Who the office works for and where: sites with their supply, customers with their sites; each one added or changed here. */
/** `onNewJob`, when given, offers a new job on each customer's and each site's row. */
export function CustomersAndSites({ onNewJob }: { onNewJob?: (customerId: string, siteId?: string) => void } = {}) {
  const [tab, setTab] = useState<'sites' | 'customers'>('sites');
  const [search, setSearch] = useState('');
  const deferred = useDeferredValue(search.trim());
  const [sitePage, setSitePage] = useState(FIRST_PAGE);
  const [customerPage, setCustomerPage] = useState(FIRST_PAGE);
  const [editing, setEditing] = useState<Editing>(null);
  const sites = useSites({ search: deferred, page: sitePage.page + 1, pageSize: sitePage.pageSize });
  const customers = useCustomers(deferred, customerPage.page + 1, customerPage.pageSize);
  // Every customer for the site form's choice; small firms have dozens, not thousands.
  const allCustomers = useCustomers('', 1, 200);

  const siteColumns: GridColDef<Site>[] = [
    {
      field: 'name',
      headerName: 'Site',
      flex: 2,
      minWidth: 240,
      renderCell: ({ row }) => (
        <div>
          <Link component={RouterLink} to={paths.site.href(row.id)} underline="hover" sx={{ fontWeight: 500 }}>
            {row.name ?? row.address}
          </Link>
          <Typography variant="body2" color="text.secondary">
            {row.address}
            {row.postcode ? `, ${row.postcode}` : ''}
          </Typography>
        </div>
      ),
    },
    { field: 'customerName', headerName: 'Customer', flex: 1.2, minWidth: 180, valueGetter: (v: string | null) => v ?? '—' },
    { field: 'earthing', headerName: 'Earthing', width: 110, valueGetter: (v: string | null) => v ?? '—' },
    { field: 'zeOhm', headerName: 'Ze (Ω)', width: 90, align: 'right', headerAlign: 'right', valueGetter: (v: number | null) => v ?? '—' },
    { field: 'pfcKa', headerName: 'PFC (kA)', width: 100, align: 'right', headerAlign: 'right', valueGetter: (v: number | null) => v ?? '—' },
    {
      field: 'actions',
      headerName: '',
      width: onNewJob ? 112 : 64,
      sortable: false,
      renderCell: ({ row }) => (
        <Stack direction="row">
          <Tooltip title="Change the site's details">
            <IconButton aria-label={`Change ${row.name ?? row.address}`} onClick={() => setEditing({ kind: 'site', site: row })}>
              <EditOutlined />
            </IconButton>
          </Tooltip>
          {onNewJob && (
            <Tooltip title="Take a new job at this site">
              <IconButton aria-label={`New job at ${row.name ?? row.address}`} onClick={() => onNewJob(row.customerId, row.id)}>
                <PostAddOutlined />
              </IconButton>
            </Tooltip>
          )}
        </Stack>
      ),
    },
  ];

  const customerColumns: GridColDef<Customer>[] = [
    { field: 'name', headerName: 'Name', flex: 1.2, minWidth: 200, renderCell: ({ row }) => <Typography sx={{ fontWeight: 500 }}>{row.name}</Typography> },
    { field: 'phone', headerName: 'Phone', width: 150, valueGetter: (v: string | null) => v ?? '—' },
    { field: 'email', headerName: 'E-mail', flex: 1, minWidth: 200, valueGetter: (v: string | null) => v ?? '—' },
    {
      field: 'sites',
      headerName: 'Sites',
      flex: 1.2,
      minWidth: 200,
      sortable: false,
      renderCell: ({ row }) =>
        row.sites?.length ? (
          <Stack spacing={0.25}>
            {row.sites.map((s) => (
              <Link key={s.id} component={RouterLink} to={paths.site.href(s.id)} underline="hover">
                {s.name}
              </Link>
            ))}
          </Stack>
        ) : (
          <Typography color="text.secondary">No sites yet</Typography>
        ),
    },
    {
      field: 'actions',
      headerName: '',
      width: onNewJob ? 160 : 112,
      sortable: false,
      renderCell: ({ row }) => (
        <Stack direction="row">
          <Tooltip title="Change the customer's details">
            <IconButton aria-label={`Change ${row.name}`} onClick={() => setEditing({ kind: 'customer', customer: row })}>
              <EditOutlined />
            </IconButton>
          </Tooltip>
          <Tooltip title="Add a site for this customer">
            <IconButton aria-label={`Add a site for ${row.name}`} onClick={() => setEditing({ kind: 'site', customerId: row.id })}>
              <AddHomeWorkOutlined />
            </IconButton>
          </Tooltip>
          {onNewJob && (
            <Tooltip title="Take a new job for this customer">
              <IconButton aria-label={`New job for ${row.name}`} onClick={() => onNewJob(row.id)}>
                <PostAddOutlined />
              </IconButton>
            </Tooltip>
          )}
        </Stack>
      ),
    },
  ];

  const shown = tab === 'sites' ? sites : customers;
  /** What both lists share: paged on the server, in the server's order, and what to say when empty. */
  const paged = (
    q: { data?: { total: number }; isFetching: boolean },
    model: GridPaginationModel,
    onChange: (m: GridPaginationModel) => void,
    noMatch: string,
    none: string,
  ) => ({
    rowCount: q.data?.total ?? 0,
    loading: q.isFetching,
    paginationModel: model,
    onPaginationModelChange: onChange,
    disableColumnSorting: true,
    localeText: { noRowsLabel: deferred ? noMatch : none },
  });
  return (
    <>
      <Stack direction="row" sx={{ alignItems: 'center', gap: 2, mb: 2, flexWrap: 'wrap' }}>
        <Tabs value={tab} onChange={(_, v: 'sites' | 'customers') => setTab(v)} aria-label="Customers and sites">
          <Tab value="sites" label="Sites" />
          <Tab value="customers" label="Customers" />
        </Tabs>
        <Box sx={{ flex: 1 }} />
        <TextField
          size="small"
          label={tab === 'sites' ? 'Find a site' : 'Find a customer'}
          value={search}
          onChange={(e) => {
            setSearch(e.target.value);
            setSitePage((p) => ({ ...p, page: 0 }));
            setCustomerPage((p) => ({ ...p, page: 0 }));
          }}
          sx={{ width: 280 }}
          fullWidth={false}
        />
        <Button variant="outlined" startIcon={<PersonAddAltOutlined />} onClick={() => setEditing({ kind: 'customer' })}>
          Add customer
        </Button>
        <Button variant="contained" startIcon={<AddBusinessOutlined />} onClick={() => setEditing({ kind: 'site' })}>
          Add site
        </Button>
      </Stack>
      {shown.isError ? (
        <Alert severity="error">{shown.error.message}</Alert>
      ) : tab === 'sites' ? (
        <RecordGrid label="Sites" rows={sites.data?.items ?? []} columns={siteColumns} {...paged(sites, sitePage, setSitePage, 'No site matches that.', 'No sites yet: add a customer, then their site.')} />
      ) : (
        <RecordGrid label="Customers" rows={customers.data?.items ?? []} columns={customerColumns} {...paged(customers, customerPage, setCustomerPage, 'No customer matches that.', 'No customers yet.')} />
      )}
      {editing?.kind === 'customer' && (
        <CustomerDialog
          customer={editing.customer}
          onClose={() => setEditing(null)}
          // A new customer usually comes with a site: offer it straight away.
          onSaved={(c) => setEditing(editing.customer ? null : { kind: 'site', customerId: c.id })}
        />
      )}
      {editing?.kind === 'site' && <SiteDialog site={editing.site} customerId={editing.customerId} customers={allCustomers.data?.items ?? []} onClose={() => setEditing(null)} />}
    </>
  );
}
