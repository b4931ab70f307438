import Box from '@mui/material/Box';
import Chip from '@mui/material/Chip';
import Popover from '@mui/material/Popover';
import Typography from '@mui/material/Typography';
import { type CheckResult, VERDICT_DISCLAIMER, type Verdict } from '@wiretrail/core';
import { useId, useState } from 'react';

export const VERDICT_WORDS: Record<Verdict, string> = { pass: 'Pass', fail: 'Fail', check: 'Check' };
const COLOUR = { pass: 'success', fail: 'error', check: 'warning' } as const;

const figure = (n: number | null, unit: string) => (n === null ? '—' : `${n}${unit ? ` ${unit}` : ''}`);

/**
 * A verdict that opens to say what was judged against what, where the limit comes from, and that the verdict is an
 * aid to a competent person, not the last word.
 */
export function VerdictChip({ title, result, label }: { title: string; result: CheckResult; label?: string }) {
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const id = useId();
  return (
    <>
      <Chip
        size="small"
        variant={result.verdict === 'fail' ? 'filled' : 'outlined'}
        color={COLOUR[result.verdict]}
        label={label ?? VERDICT_WORDS[result.verdict]}
        onClick={(e) => setAnchor(e.currentTarget)}
        aria-haspopup="dialog"
        aria-label={`${title}: ${VERDICT_WORDS[result.verdict]}. Show the limit and its source`}
      />
      <Popover
        open={!!anchor}
        anchorEl={anchor}
        onClose={() => setAnchor(null)}
        anchorOrigin={{ vertical: 'bottom', horizontal: 'left' }}
        slotProps={{ paper: { role: 'dialog', 'aria-labelledby': id, sx: { p: 2, maxWidth: 380 } } }}
      >
        <Typography variant="h3" id={id} sx={{ mb: 1 }}>
          {title}: {VERDICT_WORDS[result.verdict]}
        </Typography>
        <Box component="dl" sx={{ display: 'grid', gridTemplateColumns: 'auto 1fr', columnGap: 2, rowGap: 0.5, m: 0, '& dt': { color: 'text.secondary' }, '& dd': { m: 0 } }}>
          <dt>Measured</dt>
          <dd>{figure(result.value, result.unit)}</dd>
          <dt>Limit</dt>
          <dd>{figure(result.limit, result.unit)}</dd>
          <dt>Source</dt>
          <dd>{result.source}</dd>
        </Box>
        <Typography sx={{ mt: 1 }}>{result.note}</Typography>
        <Typography variant="body2" color="text.secondary" sx={{ mt: 1.5 }}>
          {VERDICT_DISCLAIMER}
        </Typography>
      </Popover>
    </>
  );
}
