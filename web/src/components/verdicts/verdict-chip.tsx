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
import { VERDICT_COLOURS, VERDICT_WORDS } from './verdict-words';

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
      An aid only: the regulations in force, local codes and a competent person decide.
    </Typography>
  );
}

type Judged = Pick<CheckResult, 'verdict' | 'value' | 'limit' | 'unit' | 'source' | 'note'>;

interface JudgedProps {
  /** What was judged, said before the verdict: "Earth fault loop impedance Zs". */
  what: string;
  result: Judged;
  size?: 'small' | 'medium';
  /**
   * What the figure beside the verdict is: a limit; the value a reading should be close to; the most two readings
   * may differ by; or nothing worth showing on the chip (the sentence or the reading beside it says it better).
   */
  against?: 'limit' | 'expected' | 'within' | 'none';
  /** Said before the verdict on the chip itself, where a row holds several: "Overall". */
  prefix?: string;
  /** Without its icon, where a table holds a chip per reading and the columns are narrow. */
  plain?: boolean;
}

interface SummaryProps {
  /** A verdict with nothing to open, for a row that leads elsewhere (a list of cables, a schedule's column). */
  verdict: Verdict;
  size?: 'small' | 'medium';
  prefix?: string;
}

/**
 * A verdict as a chip, the same on the phone and at the desk. Given a judged result, a tap shows the figure, the
 * limit and where the limit comes from; given a verdict alone, it only says it.
 */
export function VerdictChip(props: JudgedProps | SummaryProps) {
  if ('verdict' in props) {
    const { verdict, size = 'small', prefix } = props;
    return (
      <Chip
        icon={ICONS[verdict]}
        label={`${prefix ? `${prefix}: ` : ''}${VERDICT_WORDS[verdict]}`}
        color={VERDICT_COLOURS[verdict]}
        variant={verdict === 'check' ? 'outlined' : 'filled'}
        size={size}
      />
    );
  }
  return <JudgedChip {...props} />;
}

function JudgedChip({ what, result, size = 'medium', against = 'limit', prefix, plain = false }: JudgedProps) {
  const [open, setOpen] = useState(false);
  const words = VERDICT_WORDS[result.verdict];
  const said = { limit: 'limit ', expected: 'expect about ', within: 'within ±', none: '' }[against];
  const limit = result.limit !== null && against !== 'none' ? ` · ${said}${figure(result.limit, result.unit)}` : '';
  return (
    <>
      <Chip
        icon={plain ? undefined : ICONS[result.verdict]}
        label={`${prefix ? `${prefix}: ` : ''}${words}${limit}`}
        color={VERDICT_COLOURS[result.verdict]}
        variant={result.verdict === 'check' ? 'outlined' : 'filled'}
        size={size}
        onClick={() => setOpen(true)}
        aria-label={`${what}: ${words}${limit}. Show how it was judged`}
        aria-haspopup="dialog"
        // A thumb's width on a phone (WCAG 2.5.5); a desk's table keeps its rows tight.
        sx={{ fontWeight: 500, minHeight: { xs: 44, sm: size === 'small' ? 32 : 40 }, maxWidth: '100%' }}
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
