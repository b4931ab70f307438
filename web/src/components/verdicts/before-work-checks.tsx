import Alert from '@mui/material/Alert';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { BeforeWorkLine, ChecksBeforeWork } from '@wiretrail/core';
import { AidLine, VerdictChip } from './verdict-chip';

/** Where a required RCD is missing the line is a warning in its own right, not one chip among others. */
function Line({ line }: { line: BeforeWorkLine }) {
  const { result } = line;
  const missingRcd = line.key === 'rcd' && result.verdict === 'fail';
  return (
    <Stack spacing={0.5} component="li" aria-label={line.label} sx={{ listStyle: 'none' }}>
      <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap', rowGap: 0.5 }}>
        <Typography variant="body2" sx={{ fontWeight: 500 }}>
          {line.label}
        </Typography>
        <VerdictChip what={line.label} result={result} size="small" against="none" />
      </Stack>
      {line.figure && !missingRcd && <Typography>{line.figure}</Typography>}
      {missingRcd ? (
        <Alert severity="error" role="alert">
          {line.figure}. {result.note}
        </Alert>
      ) : (
        <Typography variant="body2" color={result.verdict === 'fail' ? 'error' : 'text.secondary'}>
          {result.note}
        </Typography>
      )}
      <Typography variant="caption" color="text.secondary">
        Source: {result.source}
      </Typography>
    </Stack>
  );
}

/** The checks before breaking into a circuit, as the phone works them out and the office reads them. */
export function BeforeWorkChecks({ checks, title = 'Before the work' }: { checks: ChecksBeforeWork; title?: string }) {
  return (
    <Stack spacing={1.25} component="section" aria-label={title}>
      <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
        <Typography variant="h3">{title}</Typography>
        <VerdictChip verdict={checks.verdict} />
      </Stack>
      <Stack spacing={1.5} component="ul" sx={{ m: 0, p: 0 }}>
        {checks.lines.map((l) => (
          <Line key={l.key} line={l} />
        ))}
      </Stack>
      <AidLine />
    </Stack>
  );
}

/** One short line per check for a table cell; each chip opens the figure, the limit and the source. */
export function BeforeWorkSummary({ checks, what }: { checks: ChecksBeforeWork; what: string }) {
  return (
    <Stack spacing={0.5} sx={{ py: 0.5 }}>
      {checks.lines.map((l) => (
        <Stack key={l.key} direction="row" sx={{ alignItems: 'center', gap: 0.75 }}>
          <VerdictChip what={`${what}: ${l.label}`} result={l.result} size="small" against="none" plain />
          <Typography variant="body2" sx={{ whiteSpace: 'normal' }}>
            {l.figure ?? `${l.label}: to be entered`}
          </Typography>
        </Stack>
      ))}
    </Stack>
  );
}
