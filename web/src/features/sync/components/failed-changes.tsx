import Button from '@mui/material/Button';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import type { SyncEntityName } from '@wiretrail/core';
import type { FailedEntry } from '@/lib/db';
import { dismissFailedChange, useFailedChanges } from '../data/get-failed-changes';

const ENTITY_WORDS: Record<SyncEntityName, string> = {
  customer: 'Customer', site: 'Site', area: 'Area', board: 'Board', circuit: 'Circuit', job: 'Job', visit: 'Visit', photo: 'Photo',
  note: 'Note', cableRun: 'Cable run', pointChange: 'Point change', testResult: 'Test result', document: 'Document', conflict: 'Conflict',
  priceItem: 'Price list item', materialLine: 'Part used', linkTest: 'Performance results', photoMarkup: 'Routes on a photo',
};

const when = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });

/** What was typed, in a few words, so the technician recognises it. */
export function failedSummary(f: FailedEntry): string {
  const what = ENTITY_WORDS[f.entity] ?? f.entity;
  if (f.delete) return `Removing a ${what.toLowerCase()}`;
  const set = f.set ?? {};
  const words = [set.number, set.name, set.label, set.description, set.text].filter((v) => typeof v === 'string' && v).join(' · ');
  return words ? `${what}: ${words.length > 120 ? `${words.slice(0, 117)}…` : words}` : what;
}

/** Changes the office system refused for good, with its reason; kept until the technician has read them. */
export function FailedChanges({ userId }: { userId: string }) {
  const failed = useFailedChanges(userId);
  if (!failed || failed.length === 0) return null;
  return (
    <Paper variant="outlined" sx={{ borderColor: 'error.main' }} component="section" aria-labelledby="failed-heading">
      <Typography variant="h3" id="failed-heading" sx={{ px: 2, pt: 2 }}>
        Not accepted by the office system
      </Typography>
      <Typography variant="body2" color="text.secondary" sx={{ px: 2, pt: 0.5 }}>
        These were not saved at the office. Record them again if they are still needed, or tell the office.
      </Typography>
      <List>
        {failed.map((f) => (
          <ListItem
            key={f.seq}
            divider
            secondaryAction={
              <Button size="small" onClick={() => void dismissFailedChange(f.seq!)} aria-label={`Dismiss: ${failedSummary(f)}`}>
                Dismiss
              </Button>
            }
            sx={{ pr: 13 }}
          >
            <ListItemText
              primary={failedSummary(f)}
              secondary={
                <>
                  <Typography component="span" variant="body2" color="error" sx={{ display: 'block' }}>
                    {f.error}
                  </Typography>
                  {`Recorded ${when.format(new Date(f.createdAt))}`}
                </>
              }
            />
          </ListItem>
        ))}
      </List>
    </Paper>
  );
}
