import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { CableRunAssessment } from '@wiretrail/core';
import { AidLine, VerdictChip } from '@/components/verdicts/verdict-chip';
import { FAULT_WORDS } from '../cable-words';

/** The wiremap and length verdicts of a cable, each fault named with its pins. */
export function CableVerdicts({ assessment }: { assessment: CableRunAssessment }) {
  const { wiremap, length, missing, problems, notes } = assessment;
  return (
    <Stack spacing={1} component="section" aria-label="Cable test verdicts">
      {wiremap && wiremap.verdict !== 'check' && (
        <Stack spacing={0.5}>
          <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
            <Typography variant="body2" sx={{ fontWeight: 500, minWidth: 72 }}>
              Wiremap
            </Typography>
            <VerdictChip what="Wiremap" result={{ ...wiremap, value: null, limit: null, unit: '' }} />
          </Stack>
          {wiremap.faults.map((f, i) => (
            <Typography key={i} variant="body2" color="error" role="status">
              {FAULT_WORDS[f.kind]} on pins {f.pins.join(', ')}
              {f.end ? ` (${f.end === 'near' ? 'end A' : 'end B'})` : ''}: {f.note}
            </Typography>
          ))}
        </Stack>
      )}
      {length && (
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
          <Typography variant="body2" sx={{ fontWeight: 500, minWidth: 72 }}>
            Length
          </Typography>
          <VerdictChip what="Length" result={length} />
        </Stack>
      )}
      {problems.map((p) => (
        <Typography key={p} variant="body2" color="error">
          {p}
        </Typography>
      ))}
      {missing.length > 0 && (
        <Typography variant="body2" color="text.secondary">
          Still to record: {missing.join(', ')}.
        </Typography>
      )}
      {notes.map((n) => (
        <Typography key={n} variant="body2" color="text.secondary">
          {n}
        </Typography>
      ))}
      <AidLine />
    </Stack>
  );
}
