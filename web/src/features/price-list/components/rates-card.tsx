import AddOutlined from '@mui/icons-material/AddOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { VisuallyHidden } from '@/components/visually-hidden';

interface Props {
  title: string;
  about: string;
  addLabel: string;
  onAdd: () => void;
  error?: string;
  loading: boolean;
  columns: string[];
  rows: Array<{ key: string; name: string; cells: ReactNode[]; onChange: () => void }>;
}

/** A short list of rates with a change button on each and an add button: VAT rates and labour rates look alike. */
export function RatesCard({ title, about, addLabel, onAdd, error, loading, columns, rows }: Props) {
  const id = `${title.toLowerCase().replace(/\W+/g, '-')}-heading`;
  return (
    <Paper component="section" aria-labelledby={id} variant="outlined" sx={{ p: 2 }}>
      <Stack direction="row" sx={{ justifyContent: 'space-between', alignItems: 'flex-start', gap: 2, mb: 1 }}>
        <div>
          <Typography variant="h3" id={id}>
            {title}
          </Typography>
          <Typography variant="body2" color="text.secondary">
            {about}
          </Typography>
        </div>
        <Button startIcon={<AddOutlined />} onClick={onAdd} sx={{ flexShrink: 0 }}>
          {addLabel}
        </Button>
      </Stack>
      {error && <Alert severity="error">{error}</Alert>}
      {loading ? (
        <LinearProgress aria-label={`Loading ${title.toLowerCase()}`} />
      ) : (
        <Table size="small" aria-label={title}>
          <TableHead>
            <TableRow>
              {columns.map((c) => (
                <TableCell key={c}>{c}</TableCell>
              ))}
              <TableCell align="right">
                <VisuallyHidden>Actions</VisuallyHidden>
              </TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {rows.map((r) => (
              <TableRow key={r.key}>
                {r.cells.map((c, i) => (
                  <TableCell key={columns[i]} sx={{ whiteSpace: i === 0 ? undefined : 'nowrap' }}>
                    {c}
                  </TableCell>
                ))}
                <TableCell align="right">
                  <Button size="small" onClick={r.onChange} aria-label={`Change ${r.name}`}>
                    Change
                  </Button>
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
    </Paper>
  );
}
