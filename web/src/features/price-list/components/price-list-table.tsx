import AddOutlined from '@mui/icons-material/AddOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import FormControlLabel from '@mui/material/FormControlLabel';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import Typography from '@mui/material/Typography';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import { formatMoney, formatRate } from '@wiretrail/core';
import { useMemo, useState } from 'react';
import { useVatRates } from '@/lib/vat-rates';
import { type PriceItem, usePriceItems } from '@/lib/price-list';
import { PriceItemDialog } from './price-item-dialog';

const money = (v: number | null | undefined) => (typeof v === 'number' ? formatMoney(v) : '—');

/** The organisation's price list: what phones offer technicians as parts, and what invoices price them at. */
export function PriceListTable() {
  const items = usePriceItems();
  const rates = useVatRates();
  const [editing, setEditing] = useState<PriceItem | 'new' | null>(null);
  const [withdrawn, setWithdrawn] = useState(false);
  const rateOf = useMemo(() => new Map((rates.data?.items ?? []).map((r) => [r.code, r.basisPoints])), [rates.data]);
  const rows = (items.data?.items ?? []).filter((i) => withdrawn || i.active !== false);

  const columns: GridColDef<PriceItem>[] = [
    {
      field: 'name',
      headerName: 'Item and code',
      flex: 1,
      minWidth: 260,
      renderCell: ({ row }) => (
        <Box sx={{ lineHeight: 1.3, py: 0.75, overflow: 'hidden' }}>
          <Box sx={{ overflow: 'hidden', textOverflow: 'ellipsis' }} title={row.name}>
            {row.name}
          </Box>
          <Typography variant="caption" color="text.secondary">
            {row.code ?? 'No code'}
          </Typography>
        </Box>
      ),
      getApplyQuickFilterFn: (value: string) => (_, row) => [row.name, row.code, row.category].some((v) => v?.toLowerCase().includes(value.toLowerCase())),
    },
    { field: 'category', headerName: 'Category', width: 136 },
    { field: 'unit', headerName: 'Unit', width: 64 },
    { field: 'costMinor', headerName: 'Cost', width: 88, type: 'number', valueFormatter: (v) => money(v) },
    { field: 'sellMinor', headerName: 'Sell', width: 88, type: 'number', valueFormatter: (v) => money(v) },
    {
      field: 'margin',
      headerName: 'Margin',
      width: 88,
      type: 'number',
      valueGetter: (_, row) => (typeof row.sellMinor === 'number' && typeof row.costMinor === 'number' ? row.sellMinor - row.costMinor : null),
      valueFormatter: (v) => money(v),
    },
    {
      field: 'vatRateCode',
      headerName: 'VAT',
      width: 72,
      valueFormatter: (v: string | null) => (v && rateOf.has(v) ? formatRate(rateOf.get(v)!) : (v ?? '—')),
    },
    {
      field: 'active',
      headerName: 'Offered',
      width: 112,
      renderCell: ({ value }) => (value === false ? <Chip size="small" label="Withdrawn" variant="outlined" /> : 'Yes'),
    },
    {
      field: 'actions',
      headerName: '',
      width: 96,
      sortable: false,
      filterable: false,
      renderCell: ({ row }) => (
        <Button size="small" onClick={() => setEditing(row)} aria-label={`Change ${row.name}`} sx={{ minHeight: 36 }}>
          Change
        </Button>
      ),
    },
  ];

  return (
    <Stack spacing={2}>
      <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between', gap: 2, flexWrap: 'wrap' }}>
        <Typography color="text.secondary" sx={{ maxWidth: 720 }}>
          Every technician’s phone gets this list to pick the parts they use, with or without signal. Invoices price those parts at the sell price here.
        </Typography>
        <Stack direction="row" spacing={2} sx={{ alignItems: 'center' }}>
          <FormControlLabel control={<Switch checked={withdrawn} onChange={(_, on) => setWithdrawn(on)} />} label="Show withdrawn" />
          <Button variant="contained" startIcon={<AddOutlined />} onClick={() => setEditing('new')}>
            Add item
          </Button>
        </Stack>
      </Stack>
      {items.isError && <Alert severity="error">{items.error.message}</Alert>}
      <Paper variant="outlined" sx={{ height: 'calc(100dvh - 300px)', minHeight: 420 }}>
        <DataGrid
          rows={rows}
          columns={columns}
          loading={items.isPending}
          showToolbar
          label="Price list"
          disableRowSelectionOnClick
          rowHeight={56}
          initialState={{ sorting: { sortModel: [{ field: 'category', sort: 'asc' }] } }}
          slotProps={{ toolbar: { showQuickFilter: true, quickFilterProps: { debounceMs: 200 } } }}
          sx={{ border: 0 }}
        />
      </Paper>
      <PriceItemDialog open={editing !== null} item={editing === 'new' ? null : editing} onClose={() => setEditing(null)} />
    </Stack>
  );
}
