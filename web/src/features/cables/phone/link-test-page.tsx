import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { judgeLinkTest, linkTestAgainstWords } from '@wiretrail/core';
import { VerdictChip } from '@/components/verdicts/verdict-chip';
import type { CableRunRow, LinkTestRow } from '@/lib/db';
import { createRecords, saveRecord } from '@/lib/sync/local-write';
import { LinkTestEntry } from '../components/link-test-entry';
import { useLinkTests } from '../data/get-link-tests';

const when = (iso: string | null) => (iso ? new Date(iso).toLocaleString('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' }) : 'time not recorded');

/**
 * A cable's performance results on the phone: this visit's test of it, typed or corrected here offline, and the
 * earlier tests below. A new test starts from the last one's limit set and tester, which rarely change on a job.
 */
export function LinkTestPage({ cable, visitId, locked, onSaved }: { cable: CableRunRow; visitId: string; locked: boolean; onSaved: () => void }) {
  const tests = useLinkTests(cable.id);
  if (!tests) return null;
  const ours = tests.find((t) => t.visitId === visitId) ?? null;
  const last = tests[0] ?? null;
  const carried = ours ?? (last ? { medium: last.medium, limitSet: last.limitSet, testerMake: last.testerMake, testerModel: last.testerModel, testerSerial: last.testerSerial, calibratedOn: last.calibratedOn, adapter: last.adapter, fibreMode: last.fibreMode } : null);
  const earlier = tests.filter((t) => t !== ours);
  return (
    <Stack spacing={2}>
      <LinkTestEntry
        key={ours?.id ?? 'new'}
        cableLabel={cable.label}
        defaultMedium={cable.medium === 'fibre' ? 'fibre' : 'copper'}
        recorded={carried}
        draftKey={locked ? null : `linkTest.${ours?.id ?? `new.${visitId}.${cable.id}`}`}
        locked={locked}
        saveLabel={ours ? 'Save results' : 'Save new results'}
        onSave={async (fields) => {
          const stamped = { ...fields, testedAt: new Date().toISOString() };
          if (ours) await saveRecord('linkTest', ours.id, stamped);
          else {
            const created = Object.fromEntries(Object.entries({ visitId, siteId: cable.siteId, cableRunId: cable.id, ...stamped }).filter(([, v]) => v !== null));
            await createRecords([{ entity: 'linkTest', fields: created }]);
          }
          onSaved();
        }}
      />
      {earlier.length > 0 && (
        <Stack spacing={1} component="section" aria-labelledby="earlier-tests">
          <Typography variant="h3" id="earlier-tests">
            Earlier tests of {cable.label}
          </Typography>
          <Paper variant="outlined">
            <List disablePadding>
              {earlier.map((t: LinkTestRow) => (
                <ListItem key={t.id} divider secondaryAction={<VerdictChip verdict={judgeLinkTest(t).verdict} />}>
                  <ListItemText primary={linkTestAgainstWords(t)} secondary={[t.testerModel, t.testerSerial, when(t.testedAt ?? null)].filter(Boolean).join(' · ')} />
                </ListItem>
              ))}
            </List>
          </Paper>
        </Stack>
      )}
    </Stack>
  );
}
