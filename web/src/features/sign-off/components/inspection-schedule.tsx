import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import { INSPECTION_ITEMS, INSPECTION_MARK_STATES, INSPECTION_MARK_WORDS, type InspectionMark, type InspectionMarks, inspectionMarkOf, inspectionProblems } from '@wiretrail/core';
import { useState } from 'react';
import { DraftNotice } from '@/components/forms/draft-notice';
import { startingValues, useFormDraft } from '@/components/forms/form-draft';
import type { VisitRow } from '@/lib/db';
import { saveRecord } from '@/lib/sync/local-write';

type MarkState = InspectionMark['state'];
const GROUPS = [...new Set(INSPECTION_ITEMS.map((i) => i.group))];

/** The marks as recorded on the visit, kept to the items the schedule has. */
function recordedMarks(visit: VisitRow): Record<string, InspectionMark> {
  return Object.fromEntries(INSPECTION_ITEMS.flatMap((it) => {
    const mark = inspectionMarkOf(visit.inspectionMarks, it.id);
    return mark ? [[it.id, mark]] : [];
  }));
}

/**
 * The schedule of inspections of an installation certificate as quick taps: each item done, not applicable, or a
 * limitation, which needs a note saying what limited it. A tap is saved at once; a note as typed is kept as a draft
 * until it is saved (when the field is left), so nothing typed is lost offline.
 */
export function InspectionSchedule({ visit, locked }: { visit: VisitRow; locked: boolean }) {
  const marks = recordedMarks(visit);
  const recordedNotes = Object.fromEntries(INSPECTION_ITEMS.map((it) => [it.id, marks[it.id]?.note ?? '']));
  const key = `inspections.${visit.id}`;
  const [notes, setNotes] = useState<Record<string, string>>(() => startingValues(key, recordedNotes));
  const draft = useFormDraft(locked ? null : key, notes, recordedNotes, setNotes);
  const open = inspectionProblems(marks);
  const unmarked = INSPECTION_ITEMS.filter((it) => !marks[it.id]);

  const save = async (next: Record<string, InspectionMark>) => {
    const kept: InspectionMarks = next;
    await saveRecord('visit', visit.id, { inspectionMarks: kept });
  };
  const mark = (id: string, state: MarkState | null) => {
    if (!state) return;
    const note = (notes[id] ?? '').trim();
    void save({ ...marks, [id]: state === 'limitation' ? { state, note: note || null } : { state } });
  };
  const saveNote = async (id: string) => {
    const current = marks[id];
    if (current?.state !== 'limitation') return;
    await save({ ...marks, [id]: { state: 'limitation', note: (notes[id] ?? '').trim() || null } });
    draft.settle({ ...notes });
  };

  return (
    <Paper variant="outlined" component="section" aria-labelledby="inspections-heading" sx={{ p: 1.5 }}>
      <Stack spacing={1.5}>
        <Typography variant="h3" id="inspections-heading" sx={{ fontSize: '1.1rem', fontWeight: 500 }}>
          Schedule of inspections
        </Typography>
        <Typography variant="body2" color="text.secondary">
          {open.length === 0 ? 'Every item is marked.' : `${open.length} of ${INSPECTION_ITEMS.length} still to mark or explain.`} A limitation needs a note saying what limited the
          inspection.
        </Typography>
        <DraftNotice draft={draft} disabled={locked} />
        {!locked && unmarked.length > 0 && (
          <Button variant="outlined" onClick={() => void save({ ...marks, ...Object.fromEntries(unmarked.map((it) => [it.id, { state: 'done' as const }])) })}>
            Mark the {unmarked.length} open items done
          </Button>
        )}
        {GROUPS.map((group) => (
          <Stack key={group} spacing={1} component="section" aria-label={group}>
            <Typography sx={{ fontWeight: 500 }}>{group}</Typography>
            {INSPECTION_ITEMS.filter((it) => it.group === group).map((it) => {
              const m = marks[it.id];
              const needsNote = m?.state === 'limitation' && !(notes[it.id] ?? '').trim();
              return (
                <Stack key={it.id} spacing={0.75} sx={{ borderTop: 1, borderColor: 'divider', pt: 1 }}>
                  <Typography variant="body2" id={`inspection-${it.id}`}>
                    {it.words} <Typography component="span" variant="caption" color="text.secondary">({it.regulation})</Typography>
                  </Typography>
                  <ToggleButtonGroup
                    exclusive
                    size="small"
                    value={m?.state ?? null}
                    onChange={(_, v: MarkState | null) => mark(it.id, v)}
                    aria-labelledby={`inspection-${it.id}`}
                    disabled={locked}
                    sx={{ flexWrap: 'wrap' }}
                  >
                    {INSPECTION_MARK_STATES.map((s) => (
                      <ToggleButton key={s} value={s} sx={{ px: 1.5, minHeight: 44 }}>
                        {INSPECTION_MARK_WORDS[s]}
                      </ToggleButton>
                    ))}
                  </ToggleButtonGroup>
                  {m?.state === 'limitation' && (
                    <TextField
                      label="What limited it"
                      size="small"
                      value={notes[it.id] ?? ''}
                      onChange={(e) => setNotes((n) => ({ ...n, [it.id]: e.target.value }))}
                      onBlur={() => void saveNote(it.id)}
                      error={needsNote}
                      helperText={needsNote ? 'Say what limited the inspection of this item.' : ' '}
                      disabled={locked}
                      slotProps={{ htmlInput: { maxLength: 500 } }}
                    />
                  )}
                </Stack>
              );
            })}
          </Stack>
        ))}
      </Stack>
    </Paper>
  );
}
