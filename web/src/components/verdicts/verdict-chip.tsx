import CheckCircleOutline from '@mui/icons-material/CheckCircleOutlined';
import ErrorOutline from '@mui/icons-material/ErrorOutlineOutlined';
import HelpOutline from '@mui/icons-material/HelpOutlineOutlined';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { type CheckResult, roundTo, VERDICT_DISCLAIMER, type Verdict } from '@wiretrail/core';
import { useState } from 'react';

export const VERDICT_WORDS: Record<Verdict, string> = { pass: 'Pass', fail: 'Fail', check: 'Check' };
const COLOURS = { pass: 'success', fail: 'error', check: 'warning' } as const;
const ICONS = { pass: <CheckCircleOutline />, fail: <ErrorOutline />, check: <HelpOutline /> };

/** A figure as a meter shows it: whole numbers as they are, small ones to two places. */
export function figure(value: number | null, unit: string): string {
  if (value === null) return '—';
  const shown = Number.isInteger(value) ? String(value) : Math.abs(value) < 10 ? roundTo(value, 2).toFixed(2) : roundTo(value, 1).toFixed(1);
  return `${shown}${unit ? ` ${unit}` : ''}`;
}

/** The one line every verdict carries. */
export function AidLine() {
  return (
    <Typography variant="caption" color="text.secondary" component="p" sx={{ m: 0 }}>
      An aid only: the regulations in force, local codes and licensed practice decide.
    </Typography>
  );
}

/** A verdict as a chip; a tap shows the figure, the limit and where the limit comes from. */
export function VerdictChip({
  what,
  result,
  size = 'medium',
  against = 'limit',
}: {
  what: string;
  result: Pick<CheckResult, 'verdict' | 'value' | 'limit' | 'unit' | 'source' | 'note'>;
  size?: 'small' | 'medium';
  /**
   * What the figure beside the verdict is: a limit; the value a reading should be close to; the most two readings
   * may differ by; or nothing worth showing on the chip (the sentence beside it says it better).
   */
  against?: 'limit' | 'expected' | 'within' | 'none';
}) {
  const [open, setOpen] = useState(false);
  const words = VERDICT_WORDS[result.verdict];
  const prefix = { limit: 'limit ', expected: 'expect about ', within: 'within ±', none: '' }[against];
  const limit = result.limit !== null && against !== 'none' ? ` · ${prefix}${figure(result.limit, result.unit)}` : '';
  return (
    <>
      <Chip
        icon={ICONS[result.verdict]}
        label={`${words}${limit}`}
        color={COLOURS[result.verdict]}
        variant={result.verdict === 'check' ? 'outlined' : 'filled'}
        size={size}
        onClick={() => setOpen(true)}
        aria-label={`${what}: ${words}${limit}. Show how it was judged`}
        aria-haspopup="dialog"
        sx={{ fontWeight: 500, minHeight: size === 'small' ? 32 : 40, maxWidth: '100%' }}
      />
      <Dialog open={open} onClose={() => setOpen(false)} aria-labelledby="verdict-title" fullWidth maxWidth="xs">
        <DialogTitle id="verdict-title">
          {what}: {words}
        </DialogTitle>
        <DialogContent>
          <Stack spacing={1.5}>
            <Typography>{result.note}</Typography>
            <Stack direction="row" spacing={3}>
              <div>
                <Typography variant="caption" color="text.secondary">
                  Reading
                </Typography>
                <Typography sx={{ fontWeight: 500 }}>{figure(result.value, result.unit)}</Typography>
              </div>
              <div>
                <Typography variant="caption" color="text.secondary">
                  {against === 'expected' ? 'Expected' : against === 'within' ? 'Allowed difference' : 'Limit'}
                </Typography>
                <Typography sx={{ fontWeight: 500 }}>{figure(result.limit, result.unit)}</Typography>
              </div>
            </Stack>
            <div>
              <Typography variant="caption" color="text.secondary">
                Source
              </Typography>
              <Typography variant="body2">{result.source}</Typography>
            </div>
            <Typography variant="body2" color="text.secondary">
              {VERDICT_DISCLAIMER}
            </Typography>
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={() => setOpen(false)} size="large">
            Close
          </Button>
        </DialogActions>
      </Dialog>
    </>
  );
}
