import ContentCopyOutlined from '@mui/icons-material/ContentCopyOutlined';
import LinkOutlined from '@mui/icons-material/LinkOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import LinearProgress from '@mui/material/LinearProgress';
import MenuItem from '@mui/material/MenuItem';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { VisuallyHidden } from '@/components/visually-hidden';
import { type NewShareLink, useCreateShareLink } from '../api/create-share-link';
import { type ShareLink, useJobShareLinks } from '../api/get-job-share-links';
import { useRevokeShareLink } from '../api/revoke-share-link';

export const LINK_DAYS = [7, 14, 30, 60, 90] as const;

const day = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
const dayTime = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });
const format = (f: Intl.DateTimeFormat, iso: string | null) => (iso ? f.format(new Date(iso)) : '');

function StateChip({ link }: { link: ShareLink }) {
  if (link.state === 'revoked') return <Chip size="small" label="Withdrawn" />;
  if (link.state === 'expired') return <Chip size="small" variant="outlined" label="Expired" />;
  return <Chip size="small" color="success" variant="outlined" label="Working" />;
}

/**
 * Links a customer opens without an account to read this job's record. A new link's address is shown once, to
 * copy: the server keeps only a fingerprint of it. A link can be withdrawn at any time.
 */
export function JobShareLinks({ jobId }: { jobId: string }) {
  const links = useJobShareLinks(jobId);
  const create = useCreateShareLink(jobId);
  const revoke = useRevokeShareLink(jobId);
  const [days, setDays] = useState<number>(30);
  const [label, setLabel] = useState('');
  const [made, setMade] = useState<NewShareLink | null>(null);
  const [copied, setCopied] = useState<'yes' | 'failed' | null>(null);
  const [withdrawing, setWithdrawing] = useState<ShareLink | null>(null);

  const makeLink = () => {
    setCopied(null);
    create.mutate(
      { days, ...(label.trim() ? { label: label.trim() } : {}) },
      {
        onSuccess: (link) => {
          setMade(link);
          setLabel('');
        },
      },
    );
  };
  const copy = async (url: string) => {
    try {
      await navigator.clipboard.writeText(url);
      setCopied('yes');
    } catch {
      setCopied('failed');
    }
  };
  const items = links.data?.items ?? [];

  return (
    <Stack component="section" aria-labelledby="share-links-heading" spacing={2}>
      <Typography variant="h2" id="share-links-heading">
        Customer links
      </Typography>
      <Paper variant="outlined" sx={{ p: 2 }}>
        <Typography color="text.secondary" sx={{ mb: 2 }}>
          A link lets the customer see this job’s summary, photos and issued documents on their phone or computer, without an account. It stops
          working after the days you choose, or when you withdraw it.
        </Typography>
        <Stack direction="row" sx={{ gap: 2, flexWrap: 'wrap', alignItems: 'flex-start' }}>
          <TextField select label="Works for" value={days} onChange={(e) => setDays(Number(e.target.value))} sx={{ width: 160 }} fullWidth={false}>
            {LINK_DAYS.map((d) => (
              <MenuItem key={d} value={d}>
                {d} days
              </MenuItem>
            ))}
          </TextField>
          <TextField
            label="Who it is for (optional)"
            value={label}
            onChange={(e) => setLabel(e.target.value)}
            slotProps={{ htmlInput: { maxLength: 200 } }}
            sx={{ flex: '1 1 260px' }}
            fullWidth={false}
          />
          <Button variant="contained" startIcon={<LinkOutlined />} onClick={makeLink} disabled={create.isPending} sx={{ mt: 0.5 }}>
            Make a link
          </Button>
        </Stack>
        {create.isError && (
          <Alert severity="error" sx={{ mt: 2 }}>
            {create.error.message}
          </Alert>
        )}
        {made && (
          <Alert severity="success" sx={{ mt: 2, '& .MuiAlert-message': { flex: 1 } }} onClose={() => setMade(null)}>
            <Typography sx={{ mb: 1 }}>
              Link made; it works until {format(day, made.expiresAt)}. Copy it now: it is not shown again.
            </Typography>
            <Stack direction="row" sx={{ gap: 1, alignItems: 'center', flexWrap: 'wrap' }}>
              <TextField
                value={made.url}
                size="small"
                slotProps={{ htmlInput: { readOnly: true, 'aria-label': 'The new link' } }}
                onFocus={(e) => e.target.select()}
                sx={{ flex: '1 1 420px', bgcolor: 'background.paper', '& input': { fontFamily: 'ui-monospace, monospace', fontSize: '0.9rem' } }}
                fullWidth={false}
              />
              <Button startIcon={<ContentCopyOutlined />} onClick={() => void copy(made.url)}>
                {copied === 'yes' ? 'Copied' : 'Copy link'}
              </Button>
            </Stack>
            {copied === 'failed' && <Typography variant="body2">This browser would not copy it; select the link and copy it by hand.</Typography>}
          </Alert>
        )}
      </Paper>

      {links.isError && <Alert severity="error">{links.error.message}</Alert>}
      {revoke.isError && <Alert severity="error">{revoke.error.message}</Alert>}
      {links.isPending ? (
        <LinearProgress aria-label="Loading links" />
      ) : items.length === 0 ? (
        <Typography color="text.secondary">No links made for this job yet.</Typography>
      ) : (
        <TableContainer component={Paper} variant="outlined">
          <Table aria-label="Customer links" size="small">
            <TableHead>
              <TableRow>
                <TableCell>For</TableCell>
                <TableCell>Made</TableCell>
                <TableCell>Until</TableCell>
                <TableCell>State</TableCell>
                <TableCell>Opened</TableCell>
                <TableCell align="right">
                  <VisuallyHidden>Actions</VisuallyHidden>
                </TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {items.map((l) => (
                <TableRow key={l.id}>
                  <TableCell>{l.label || <Typography color="text.secondary">No note</Typography>}</TableCell>
                  <TableCell sx={{ whiteSpace: 'nowrap' }}>{format(dayTime, l.createdAt)}</TableCell>
                  <TableCell sx={{ whiteSpace: 'nowrap' }}>{format(day, l.state === 'revoked' ? l.revokedAt : l.expiresAt)}</TableCell>
                  <TableCell>
                    <StateChip link={l} />
                  </TableCell>
                  <TableCell sx={{ whiteSpace: 'nowrap' }}>
                    {l.openCount === 0 ? 'Not yet' : `${l.openCount === 1 ? 'Once' : `${l.openCount} times`}, last ${format(dayTime, l.lastOpenedAt)}`}
                  </TableCell>
                  <TableCell align="right">
                    {l.state === 'active' && (
                      <Button color="error" onClick={() => setWithdrawing(l)} aria-label={`Withdraw the link made ${format(dayTime, l.createdAt)}${l.label ? ` (${l.label})` : ''}`}>
                        Withdraw
                      </Button>
                    )}
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </TableContainer>
      )}

      <Dialog open={!!withdrawing} onClose={() => setWithdrawing(null)} aria-labelledby="withdraw-link-title">
        <DialogTitle id="withdraw-link-title">Withdraw this link?</DialogTitle>
        <DialogContent>
          <DialogContentText>
            Whoever has it will see a page saying it no longer works. This cannot be undone; make a new link if they need one again.
          </DialogContentText>
        </DialogContent>
        <DialogActions sx={{ px: 3, pb: 2 }}>
          <Button onClick={() => setWithdrawing(null)}>Keep it</Button>
          <Button
            color="error"
            variant="contained"
            onClick={() => {
              if (withdrawing) revoke.mutate(withdrawing.id, { onSettled: () => setWithdrawing(null) });
            }}
          >
            Withdraw
          </Button>
        </DialogActions>
      </Dialog>
    </Stack>
  );
}
