import DirectionsOutlined from '@mui/icons-material/DirectionsOutlined';
import PlaceOutlined from '@mui/icons-material/PlaceOutlined';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardActionArea from '@mui/material/CardActionArea';
import CardActions from '@mui/material/CardActions';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import Snackbar from '@mui/material/Snackbar';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useId, useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { VisuallyHidden } from '@/components/visually-hidden';
import { paths } from '@/config/paths';
import type { SiteRow } from '@/lib/db';
import { saveRecord } from '@/lib/sync/local-write';
import type { VisitSummary } from '../data/get-upcoming-visits';
import { dayLabel, timeWindow, visitStatusWords } from '../visit-format';

export function siteAddress(s: VisitSummary): string {
  return [s.site?.address, s.site?.postcode].filter(Boolean).join(', ') || 'Address not on this phone yet';
}

/** Opens the phone's maps with directions to the site. */
export function directionsHref(site: Pick<SiteRow, 'address' | 'postcode'>): string {
  return `https://www.google.com/maps/dir/?api=1&destination=${encodeURIComponent([site.address, site.postcode].filter(Boolean).join(', '))}`;
}

/** Arrival is the first thing recorded on a visit: it starts the clock and tells the office someone is there. */
export async function recordArrival(visitId: string): Promise<void> {
  await saveRecord('visit', visitId, { status: 'on-site', actualStart: new Date().toISOString() });
}

/** A mistaken arrival taken back: the visit is planned again and its clock has not started. */
export async function undoArrival(visitId: string, before: { status: string; actualStart: string | null }): Promise<void> {
  await saveRecord('visit', visitId, { status: before.status, actualStart: before.actualStart });
}

/** How long the offer to take an arrival back stays on screen. */
export const UNDO_ARRIVAL_MS = 15_000;

const clockTime = new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit' });

/** One visit on Today: when, what, who and where, with arrival and finishing one tap away. */
export function VisitCard({ summary }: { summary: VisitSummary }) {
  const { visit, job, customer, site } = summary;
  const [error, setError] = useState<string | null>(null);
  const [asking, setAsking] = useState(false);
  const [arrived, setArrived] = useState<{ at: string; before: { status: string; actualStart: string | null } } | null>(null);
  const askId = useId();
  const title = job?.title ?? 'Visit';
  const status = visit.status ?? 'planned';
  // A tap on another day's card is more likely a slip than an arrival: ask first.
  const day = visit.plannedStart ? dayLabel(visit.plannedStart) : 'Today';
  async function arrive() {
    setAsking(false);
    setError(null);
    const before = { status, actualStart: visit.actualStart ?? null };
    try {
      await recordArrival(visit.id);
      setArrived({ at: clockTime.format(new Date()), before });
    } catch (err) {
      setError((err as Error).message);
    }
  }
  async function undo() {
    if (!arrived) return;
    setArrived(null);
    try {
      await undoArrival(visit.id, arrived.before);
    } catch (err) {
      setError((err as Error).message);
    }
  }
  return (
    <Card variant="outlined" component="article" aria-label={title}>
      {/* No label of its own: the link is named by what it shows, the title first, so a screen reader says what a tap opens. */}
      <CardActionArea component={RouterLink} to={paths.visit.href(visit.id)}>
        <CardContent sx={{ pb: 1, display: 'flex', flexDirection: 'column' }}>
          <VisuallyHidden>Open </VisuallyHidden>
          <Typography variant="h3" component="h2">
            {title}
          </Typography>
          {/* Shown above the title, read after it. */}
          <Stack direction="row" sx={{ order: -1, justifyContent: 'space-between', alignItems: 'center', gap: 1, mb: 0.5 }}>
            <Typography variant="body2" sx={{ fontWeight: 500 }}>
              {visit.plannedStart ? `${dayLabel(visit.plannedStart)} · ` : ''}
              {timeWindow(visit.plannedStart, visit.plannedEnd)}
            </Typography>
            <Chip size="small" label={visitStatusWords(status)} color={status === 'on-site' ? 'secondary' : 'default'} />
          </Stack>
          {customer && <Typography color="text.secondary">{customer.name}</Typography>}
          <Stack direction="row" sx={{ gap: 0.5, alignItems: 'flex-start', mt: 0.5, color: 'text.secondary' }}>
            <PlaceOutlined fontSize="small" sx={{ mt: '2px' }} />
            <Typography variant="body2">{siteAddress(summary)}</Typography>
          </Stack>
          {site?.accessNotes && (
            <Typography variant="body2" sx={{ mt: 0.75 }}>
              <strong>Access:</strong> {site.accessNotes}
            </Typography>
          )}
        </CardContent>
      </CardActionArea>
      <CardActions sx={{ px: 2, pb: 2, pt: 0, gap: 1, flexWrap: 'wrap' }}>
        {site && (
          <Button component="a" href={directionsHref(site)} target="_blank" rel="noopener" startIcon={<DirectionsOutlined />} variant="outlined">
            Directions
          </Button>
        )}
        {status === 'planned' && (
          <Button variant="contained" onClick={() => (day === 'Today' ? arrive() : setAsking(true))} sx={{ flex: 1 }}>
            I’m on site
          </Button>
        )}
        {status === 'on-site' && (
          <>
            <Button variant="contained" component={RouterLink} to={paths.visit.href(visit.id)} sx={{ flex: 1 }}>
              Open visit
            </Button>
            <Button variant="outlined" color="secondary" component={RouterLink} to={paths.visitSignOff.href(visit.id)}>
              Sign off
            </Button>
          </>
        )}
      </CardActions>
      <Dialog open={asking} onClose={() => setAsking(false)} aria-labelledby={`${askId}-title`} aria-describedby={`${askId}-text`}>
        <DialogTitle id={`${askId}-title`}>On site for a visit booked {day === 'Tomorrow' || day === 'Yesterday' ? day.toLowerCase() : `for ${day}`}?</DialogTitle>
        <DialogContent>
          <DialogContentText id={`${askId}-text`}>
            {title} is booked for {day}, {timeWindow(visit.plannedStart, visit.plannedEnd)}. Arriving starts the clock on it now and tells the office you are there.
          </DialogContentText>
        </DialogContent>
        <DialogActions>
          <Button onClick={() => setAsking(false)} size="large">
            Not yet
          </Button>
          <Button onClick={arrive} variant="contained" size="large">
            I’m on site now
          </Button>
        </DialogActions>
      </Dialog>
      <Snackbar
        open={arrived !== null}
        autoHideDuration={UNDO_ARRIVAL_MS}
        onClose={(_, reason) => reason !== 'clickaway' && setArrived(null)}
        message={arrived ? `Arrival recorded at ${arrived.at}.` : ''}
        action={
          <Button color="inherit" size="small" onClick={undo} sx={{ color: 'secondary.light', fontWeight: 700 }}>
            Undo
          </Button>
        }
      />
      {error && (
        <Typography color="error" role="alert" variant="body2" sx={{ px: 2, pb: 2 }}>
          {error}
        </Typography>
      )}
    </Card>
  );
}
