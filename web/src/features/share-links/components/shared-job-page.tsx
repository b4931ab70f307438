import CloseOutlined from '@mui/icons-material/CloseOutlined';
import DownloadOutlined from '@mui/icons-material/DownloadOutlined';
import LinkOffOutlined from '@mui/icons-material/LinkOffOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import ButtonBase from '@mui/material/ButtonBase';
import Container from '@mui/material/Container';
import Dialog from '@mui/material/Dialog';
import IconButton from '@mui/material/IconButton';
import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useTheme } from '@mui/material/styles';
import useMediaQuery from '@mui/material/useMediaQuery';
import type { ReactNode } from 'react';
import { useState } from 'react';
import { Logo } from '@/components/logo';
import { VisuallyHidden } from '@/components/visually-hidden';
import { ApiError } from '@/lib/api-client';
import { type SharedJob, useSharedJob } from '../api/get-shared-job';
import { SharedInvoices } from './shared-invoices';

const KIND_NAMES: Record<string, string> = {
  'minor-works': 'Minor works certificate',
  'cabling-report': 'Wiremap and length record',
  'photo-record': 'Photo record',
  'installation-certificate': 'Electrical installation certificate',
  'hidden-routes': 'Hidden routes record',
};
const STATUS_WORDS: Record<string, string> = {
  enquiry: 'Enquiry',
  booked: 'Booked',
  'on-site': 'Work under way',
  paperwork: 'Work done; paperwork being finished',
  done: 'Done',
  cancelled: 'Cancelled',
};

const day = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', year: 'numeric' });
const dayTime = new Intl.DateTimeFormat('en-GB', { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });
const format = (f: Intl.DateTimeFormat, iso: string | null) => (iso && !Number.isNaN(Date.parse(iso)) ? f.format(new Date(iso)) : '');

function Frame({ contractor, children }: { contractor?: string; children: ReactNode }) {
  return (
    <Box sx={{ minHeight: '100dvh', bgcolor: 'background.default', display: 'flex', flexDirection: 'column' }}>
      <Box component="header" sx={{ bgcolor: 'primary.main', color: 'primary.contrastText', borderBottom: 3, borderColor: 'secondary.main' }}>
        <Container maxWidth="md" sx={{ py: 1.5, display: 'flex', alignItems: 'center', gap: 2, justifyContent: 'space-between' }}>
          <Logo size={30} />
          {contractor && (
            <Typography sx={{ opacity: 0.9, textAlign: 'right' }} noWrap>
              {contractor}
            </Typography>
          )}
        </Container>
      </Box>
      <Container component="main" maxWidth="md" sx={{ py: { xs: 2, sm: 3 }, flex: 1 }}>
        {children}
      </Container>
    </Box>
  );
}

/** The plain page for a link that does not work: no data, only what happened and what to do. */
function LinkRefused({ message }: { message: string }) {
  return (
    <Frame>
      <Paper variant="outlined" sx={{ p: { xs: 3, sm: 4 }, textAlign: 'center', display: 'grid', justifyItems: 'center', gap: 1.5, mt: { sm: 4 } }}>
        <LinkOffOutlined color="secondary" sx={{ fontSize: 48 }} />
        <Typography variant="h1">This link does not work</Typography>
        <Typography color="text.secondary" sx={{ maxWidth: 460 }}>
          {message}
        </Typography>
      </Paper>
    </Frame>
  );
}

function Documents({ documents }: { documents: SharedJob['documents'] }) {
  if (!documents.length) return <Typography color="text.secondary">No documents have been issued for this job yet.</Typography>;
  return (
    <Stack component="ul" aria-label="Documents" spacing={1} sx={{ listStyle: 'none', p: 0, m: 0 }}>
      {documents.map((d) => (
        <Paper component="li" key={d.id} variant="outlined" sx={{ p: 1.5, display: 'flex', gap: 2, alignItems: 'center', justifyContent: 'space-between', flexWrap: 'wrap' }}>
          <div>
            <Typography sx={{ fontWeight: 500 }}>{d.kind === 'cabling-report' && d.title?.startsWith('Cabling certification report') ? 'Cabling certification report' : (KIND_NAMES[d.kind] ?? d.kind)}</Typography>
            <Typography variant="body2" color="text.secondary">
              {d.number} · issued {format(day, d.issuedAt)}
            </Typography>
          </div>
          <Button variant="outlined" startIcon={<DownloadOutlined />} href={d.pdfUrl} download={`${d.number}.pdf`} aria-label={`Download PDF of ${d.number}`}>
            Download PDF
          </Button>
        </Paper>
      ))}
    </Stack>
  );
}

function Photos({ photos }: { photos: SharedJob['photos'] }) {
  const [open, setOpen] = useState<number | null>(null);
  const phone = useMediaQuery(useTheme().breakpoints.down('sm'));
  if (!photos.length) return <Typography color="text.secondary">No photos yet.</Typography>;
  const shown = open === null ? null : photos[open]!;
  return (
    <>
      <Box component="ul" aria-label="Photos" sx={{ listStyle: 'none', p: 0, m: 0, display: 'grid', gap: 1.5, gridTemplateColumns: { xs: 'repeat(2, minmax(0, 1fr))', sm: 'repeat(auto-fill, minmax(200px, 1fr))' } }}>
        {photos.map((p, i) => (
          <Box component="li" key={p.id}>
            <ButtonBase
              onClick={() => setOpen(i)}
              sx={{ display: 'block', width: '100%', textAlign: 'left', borderRadius: 1.5, overflow: 'hidden', border: 1, borderColor: 'divider', bgcolor: 'background.paper', '&:focus-visible': { outline: '3px solid', outlineColor: 'primary.main' } }}
            >
              {/* Named by its caption below; the thumbnail says nothing more. */}
              <VisuallyHidden>Open photo: </VisuallyHidden>
              <Box component="img" src={p.thumbUrl} alt="" loading="lazy" sx={{ width: '100%', aspectRatio: '4 / 3', objectFit: 'cover', display: 'block', bgcolor: 'action.hover' }} />
              <Box sx={{ p: 1 }}>
                <Typography variant="body2" sx={{ fontWeight: 500, display: '-webkit-box', WebkitLineClamp: 3, WebkitBoxOrient: 'vertical', overflow: 'hidden' }}>
                  {p.caption || 'No caption'}
                </Typography>
                <Typography variant="caption" color="text.secondary">
                  {[p.area, format(dayTime, p.takenAt)].filter(Boolean).join(' · ')}
                </Typography>
              </Box>
            </ButtonBase>
          </Box>
        ))}
      </Box>
      <Dialog open={!!shown} onClose={() => setOpen(null)} fullScreen={phone} maxWidth="lg" slotProps={{ paper: { 'aria-label': shown?.caption || 'Photo' } }}>
        {shown && (
          <Box sx={{ position: 'relative', bgcolor: 'background.paper' }}>
            <IconButton onClick={() => setOpen(null)} aria-label="Close the photo" sx={{ position: 'absolute', top: 8, right: 8, bgcolor: 'background.paper', '&:hover': { bgcolor: 'background.paper' } }}>
              <CloseOutlined />
            </IconButton>
            <Box component="img" src={shown.displayUrl} alt={shown.caption || 'Photo'} sx={{ display: 'block', width: '100%', maxHeight: phone ? '75dvh' : '80vh', objectFit: 'contain', bgcolor: 'common.black' }} />
            <Box sx={{ p: 2 }}>
              <Typography sx={{ fontWeight: 500 }}>{shown.caption || 'No caption'}</Typography>
              <Typography variant="body2" color="text.secondary">
                {[shown.area, format(dayTime, shown.takenAt)].filter(Boolean).join(' · ')}
              </Typography>
              <Stack direction="row" spacing={1} sx={{ mt: 1.5 }}>
                <Button disabled={open === 0} onClick={() => setOpen((i) => (i ?? 0) - 1)}>
                  Previous
                </Button>
                <Button disabled={open === photos.length - 1} onClick={() => setOpen((i) => (i ?? 0) + 1)}>
                  Next
                </Button>
              </Stack>
            </Box>
          </Box>
        )}
      </Dialog>
    </>
  );
}

/**
 * What a customer sees through a share link, on a phone or a desk: nothing to sign in to, read-only but for paying
 * an invoice by card. `paidInvoiceId` is the invoice the customer has just paid on the provider's page.
 */
export function SharedJobPage({ token, paidInvoiceId = null }: { token: string; paidInvoiceId?: string | null }) {
  const shared = useSharedJob(token);
  if (shared.isPending) {
    return (
      <Frame>
        <LinearProgress aria-label="Loading the job record" />
      </Frame>
    );
  }
  if (shared.isError) {
    const err = shared.error;
    if (err instanceof ApiError && (err.status === 404 || err.status === 410)) return <LinkRefused message={err.message} />;
    return (
      <Frame>
        <Alert severity="error" action={<Button onClick={() => void shared.refetch()}>Try again</Button>}>
          {err.message}
        </Alert>
      </Frame>
    );
  }
  const { job, contractor, photos, documents, expiresAt } = shared.data;
  return (
    <Frame contractor={contractor.name}>
      <Stack spacing={3}>
        <Paper variant="outlined" sx={{ p: { xs: 2, sm: 3 } }}>
          <Typography variant="overline" color="secondary" sx={{ fontWeight: 700 }}>
            Job record{job.reference ? ` · ${job.reference}` : ''}
          </Typography>
          <Typography variant="h1" sx={{ mt: 0.5 }}>
            {job.title}
          </Typography>
          <Box component="dl" sx={{ m: 0, mt: 2, display: 'grid', gridTemplateColumns: { xs: '1fr', sm: 'max-content 1fr' }, columnGap: 3, rowGap: { xs: 0.25, sm: 1 }, '& dt': { color: 'text.secondary', mt: { xs: 1, sm: 0 } }, '& dd': { m: 0 } }}>
            {job.customerName && (
              <>
                <dt>For</dt>
                <dd>{job.customerName}</dd>
              </>
            )}
            <dt>Where</dt>
            <dd>{job.siteAddress || '—'}</dd>
            {job.status && (
              <>
                <dt>Where it stands</dt>
                <dd>{STATUS_WORDS[job.status] ?? job.status}</dd>
              </>
            )}
          </Box>
        </Paper>

        <SharedInvoices token={token} paidInvoiceId={paidInvoiceId} />

        <Box component="section" aria-labelledby="shared-documents">
          <Typography variant="h2" id="shared-documents" sx={{ mb: 1.5 }}>
            Documents
          </Typography>
          <Documents documents={documents} />
        </Box>

        <Box component="section" aria-labelledby="shared-photos">
          <Typography variant="h2" id="shared-photos" sx={{ mb: 0.5 }}>
            Photos
          </Typography>
          <Typography color="text.secondary" sx={{ mb: 1.5 }}>
            Taken during the work, in the order they were taken{photos.length ? ` (${photos.length})` : ''}.
          </Typography>
          <Photos photos={photos} />
        </Box>

        <Box component="footer" sx={{ borderTop: 1, borderColor: 'divider', pt: 2, pb: 4, color: 'text.secondary' }}>
          <Typography variant="body2">
            This link works until {format(day, expiresAt)}. Questions about the work: {contractor.name}
            {[contractor.phone, contractor.email].filter(Boolean).length ? `, ${[contractor.phone, contractor.email].filter(Boolean).join(', ')}` : ''}.
          </Typography>
        </Box>
      </Stack>
    </Frame>
  );
}
