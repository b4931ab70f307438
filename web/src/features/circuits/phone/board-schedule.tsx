import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { circuitReading, DEFAULT_RULE_SET, type ReadingField, readingsOf, readingWords, ruleSetInForce, scheduleMaxZs } from '@wiretrail/core';
import { Link as RouterLink } from 'react-router-dom';
import { VerdictChip } from '@/components/verdicts/verdict-chip';
import { paths } from '@/config/paths';
import type { CircuitRow, TestResultRow } from '@/lib/db';
import { assess } from '../circuit-readings';
import { useCircuitTests } from '../data/get-circuit-tests';

/** The readings in the order they are taken on site: dead tests first, then live ones, then the buttons. */
const TEST_ORDER: readonly ReadingField[] = ['r1Ohm', 'rnOhm', 'r2Ohm', 'r1r2Ohm', 'r2LeadOhm', 'irTestVoltageV', 'irLiveLiveMOhm', 'irLiveEarthMOhm', 'polarity', 'zsOhm', 'rcdTripMs', 'rcdButton', 'afddButton'];
const RING_ONLY: ReadonlySet<ReadingField> = new Set(['r1Ohm', 'rnOhm', 'r2Ohm']);
const ANSWER_WORDS: Record<string, string> = { correct: 'Correct', incorrect: 'Incorrect', operates: 'Operates', fails: 'Fails' };

const figure = (v: number | null | undefined, unit: string) => (typeof v === 'number' ? `${v}${unit ? ` ${unit}` : ''}` : '—');

function Pair({ label, value }: { label: string; value: string }) {
  return (
    <>
      <Typography component="dt" variant="body2" color="text.secondary">
        {label}
      </Typography>
      <Typography component="dd" variant="body2" sx={{ m: 0, fontWeight: value === '—' ? 400 : 500 }}>
        {value}
      </Typography>
    </>
  );
}

function CircuitCard({ circuit, test, visitId, earthing, isNew }: { circuit: CircuitRow; test: TestResultRow | undefined; visitId: string; earthing: string | null | undefined; isNew: boolean }) {
  const rules = ruleSetInForce(new Date().toISOString().slice(0, 10)) ?? DEFAULT_RULE_SET;
  const limit = scheduleMaxZs(circuit, rules);
  const verdict = test ? assess(circuit, readingsOf(test), earthing).verdict : null;
  const title = `Circuit ${circuit.number}${circuit.description ? ` · ${circuit.description}` : ''}`;
  const device = [circuit.deviceStandard, circuit.deviceType ? (/^[BCD]$/.test(circuit.deviceType) ? `Type ${circuit.deviceType}` : circuit.deviceType) : null, circuit.deviceRatingA ? `${circuit.deviceRatingA} A` : null, circuit.deviceBreakingKa ? `${circuit.deviceBreakingKa} kA` : null]
    .filter(Boolean)
    .join(', ');
  const shown = TEST_ORDER.filter((f) => circuit.kind === 'ring' || !RING_ONLY.has(f));
  return (
    <Paper variant="outlined" component="article" aria-label={title} sx={{ p: 1.5 }}>
      <Stack direction="row" sx={{ alignItems: 'center', gap: 1, flexWrap: 'wrap' }}>
        <Typography variant="h3" sx={{ fontSize: '1rem', fontWeight: 500, flex: '1 1 auto' }}>
          {title}
        </Typography>
        {isNew && <Chip size="small" color="primary" variant="outlined" label="New" />}
        {verdict ? <VerdictChip verdict={verdict} prefix="Tests" /> : <Chip size="small" color="warning" variant="outlined" label="Not tested" />}
      </Stack>
      <Box component="dl" sx={{ display: 'grid', gridTemplateColumns: 'minmax(0, 1fr) minmax(0, 1fr)', columnGap: 1.5, rowGap: 0.25, my: 1 }}>
        <Pair label="Type of wiring" value={circuit.wiringType || '—'} />
        <Pair label="Reference method" value={circuit.referenceMethod || '—'} />
        <Pair label="Points served" value={figure(circuit.pointsServed, '')} />
        <Pair label="Live / cpc" value={circuit.liveCsaMm2 || circuit.cpcCsaMm2 ? `${circuit.liveCsaMm2 ?? '?'} / ${circuit.cpcCsaMm2 ?? '?'} mm²` : '—'} />
        <Pair label="Max disconnection" value={figure(circuit.maxDisconnectionS, 's')} />
        <Pair label="Device" value={device || '—'} />
        <Pair label="Max permitted Zs" value={limit.ohm === null ? '—' : `${limit.ohm} Ω`} />
        <Pair label="RCD" value={circuit.rcdRatingMa ? `${circuit.rcdType ? `Type ${circuit.rcdType}, ` : ''}${circuit.rcdRatingMa} mA` : 'None'} />
      </Box>
      <Typography variant="body2" sx={{ fontWeight: 500 }}>
        Readings, in the order taken
      </Typography>
      <Box component="dl" sx={{ display: 'grid', gridTemplateColumns: 'minmax(0, 1fr) minmax(0, 1fr)', columnGap: 1.5, rowGap: 0.25, mt: 0.5, mb: 1 }}>
        {shown.map((f) => {
          const raw = test?.[f as keyof TestResultRow];
          const value = test ? (typeof raw === 'string' ? (ANSWER_WORDS[raw] ?? raw) : readingWords(test, f)) : '';
          return <Pair key={f} label={circuitReading(f).label} value={value || '—'} />;
        })}
      </Box>
      <Button component={RouterLink} to={paths.visitCircuit.href(visitId, circuit.id)} variant={test ? 'text' : 'contained'}>
        {test ? `Change readings of circuit ${circuit.number}` : `Record readings of circuit ${circuit.number}`}
      </Button>
    </Paper>
  );
}

/**
 * The board's schedule of circuit details and test results, one card per circuit, as an installation certificate
 * carries it: every circuit of a board with a new circuit or replaced on this visit (or every board, when none is),
 * its details and its readings in the order they are taken.
 */
export function BoardSchedule({ visitId, siteId }: { visitId: string; siteId: string }) {
  const data = useCircuitTests(visitId, siteId);
  if (!data) return null;
  const concerned = data.boards.filter(({ board, circuits }) => board.replacedOnVisitId === visitId || circuits.some((c) => c.newOnVisitId === visitId));
  const shown = concerned.length ? concerned : data.boards.filter((b) => b.circuits.length > 0);
  return (
    <Stack component="section" aria-labelledby="schedule-heading" spacing={1.5}>
      <Typography variant="h2" id="schedule-heading">
        Schedule of circuits
      </Typography>
      <Typography variant="body2" color="text.secondary">
        {concerned.length
          ? 'An installation certificate schedules every circuit of the board with new work, the existing ones included: each needs its readings on this visit.'
          : 'No circuit is marked new and no board replaced on this visit: every board is shown.'}
      </Typography>
      {shown.map(({ board, circuits }) => {
        const untested = circuits.filter((c) => !data.results.has(c.id)).length;
        return (
          <Stack key={board.id} spacing={1} component="section" aria-label={`Board ${board.name}`}>
            <Typography sx={{ fontWeight: 500 }}>
              {board.name}
              {board.replacedOnVisitId === visitId ? ' (replaced on this visit)' : ''} · {untested === 0 ? 'every circuit tested' : `${untested} of ${circuits.length} still to test`}
            </Typography>
            {circuits.map((c) => (
              <CircuitCard key={c.id} circuit={c} test={data.results.get(c.id)} visitId={visitId} earthing={data.site?.earthing} isNew={c.newOnVisitId === visitId} />
            ))}
          </Stack>
        );
      })}
      <Button component={RouterLink} to={paths.visitCircuits.href(visitId)}>
        Back to the circuits
      </Button>
    </Stack>
  );
}
