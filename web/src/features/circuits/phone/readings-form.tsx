import { zodResolver } from '@hookform/resolvers/zod';
import Box from '@mui/material/Box';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import {
  checkAgainstExtension,
  circuitReading,
  type CircuitTestAssessment,
  type CircuitTestKey,
  extendRing,
  type FieldValue,
  INSULATION_TEST_VOLTAGES,
  InvalidInputError,
  type RingExtension,
  r1r2Expected,
  roundTo,
} from '@wiretrail/core';
import { type ReactNode, useMemo, useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { DraftNotice } from '@/components/forms/draft-notice';
import { startingValues, useFormDraft } from '@/components/forms/form-draft';
import { SaveBar } from '@/components/forms/phone-inputs';
import { AidLine, VerdictChip } from '@/components/verdicts/verdict-chip';
import { VERDICT_WORDS } from '@/components/verdicts/verdict-words';
import type { CircuitRow, PointChangeRow, TestResultRow } from '@/lib/db';
import { circuitReadingField, readingText, usableReading } from '@/lib/readings';
import { createRecord, type Fields, saveRecord } from '@/lib/sync/local-write';
import { assess, fromTyped, NUMERIC_READINGS, storedReadings, verdictSummary } from '../circuit-readings';

export const readingsSchema = z.object({
  r1Ohm: circuitReadingField('r1Ohm'),
  rnOhm: circuitReadingField('rnOhm'),
  r2Ohm: circuitReadingField('r2Ohm'),
  r1r2Ohm: circuitReadingField('r1r2Ohm'),
  irLiveLiveMOhm: circuitReadingField('irLiveLiveMOhm'),
  irLiveEarthMOhm: circuitReadingField('irLiveEarthMOhm'),
  irTestVoltageV: z.enum(['', '250', '500', '1000']),
  polarity: z.enum(['', 'correct', 'incorrect']),
  zsOhm: circuitReadingField('zsOhm'),
  rcdTripMs: circuitReadingField('rcdTripMs'),
  rcdTripMs5x: circuitReadingField('rcdTripMs5x'),
  rcdButton: z.enum(['', 'operates', 'fails']),
  r2LeadOhm: circuitReadingField('r2LeadOhm'),
  afddButton: z.enum(['', 'operates', 'fails']),
  instrument: z.string().max(200, 'The instrument must be at most 200 characters.'),
});
type ReadingsValues = z.infer<typeof readingsSchema>;

function defaults(result: TestResultRow | undefined): ReadingsValues {
  const typed = Object.fromEntries(NUMERIC_READINGS.map((f) => [f, readingText(result?.[f])])) as Record<(typeof NUMERIC_READINGS)[number], string>;
  return {
    ...typed,
    irTestVoltageV: result?.irTestVoltageV ? (String(result.irTestVoltageV) as ReadingsValues['irTestVoltageV']) : '500',
    polarity: result?.polarity ?? '',
    rcdButton: result?.rcdButton ?? '',
    afddButton: result?.afddButton ?? '',
    instrument: result?.instrument ?? '',
  };
}

interface Props {
  visitId: string;
  siteId: string;
  circuit: CircuitRow;
  result: TestResultRow | undefined;
  earthing: string | null | undefined;
  /** Ring extensions on this visit, whose predicted readings sit beside the measured ones. */
  extensions: PointChangeRow[];
  locked: boolean;
  onSaved: () => void;
}

/** The ring's own checks compare readings with each other; R1+R2 is compared with what the ring should give. */
const AGAINST: Partial<Record<CircuitTestKey, 'expected' | 'within'>> = { 'ring-r1-rn': 'within', 'ring-r2': 'within', r1r2: 'expected' };

const ohms = (v: number) => `${roundTo(v, 2).toFixed(2)} Ω`;

/** What this visit's ring extension(s) should have made the end-to-end readings, from the point change's own figures. */
function predictedAfter(extensions: PointChangeRow[], circuit: CircuitRow): RingExtension | null {
  const p = extensions.find((x) => x.connection === 'ring-extension' && x.beforeR1Ohm != null && x.beforeRnOhm != null && x.beforeR2Ohm != null && x.addedRouteM != null);
  const live = p?.liveCsaMm2 ?? circuit.liveCsaMm2;
  const cpc = p?.cpcCsaMm2 ?? circuit.cpcCsaMm2;
  if (!p || live == null || cpc == null) return null;
  try {
    return extendRing({ r1: p.beforeR1Ohm!, rn: p.beforeRnOhm!, r2: p.beforeR2Ohm!, liveCsaMm2: live, cpcCsaMm2: cpc, addedRouteM: p.addedRouteM! });
  } catch (err) {
    if (err instanceof InvalidInputError) return null;
    throw err;
  }
}

/** What a radial's R1+R2 should read from its cable's own resistance, once its length and sizes are recorded. */
function radialExpectation(circuit: CircuitRow): string | null {
  if (circuit.kind === 'ring' || circuit.lengthM == null || circuit.liveCsaMm2 == null || circuit.cpcCsaMm2 == null) return null;
  try {
    const e = r1r2Expected({ liveCsaMm2: circuit.liveCsaMm2, cpcCsaMm2: circuit.cpcCsaMm2, lengthM: circuit.lengthM });
    return `Expect R1+R2 of about ${ohms(e.expectedOhm)}: ${circuit.lengthM} m of ${circuit.liveCsaMm2}/${circuit.cpcCsaMm2} mm² at ${roundTo(e.perMetreMohm, 2)} mΩ/m (IEC 60228:2004, 20 °C).`;
  } catch (err) {
    if (err instanceof InvalidInputError) return null;
    throw err;
  }
}

function Verdicts({ assessment, keys }: { assessment: CircuitTestAssessment; keys: CircuitTestKey[] }) {
  const lines = assessment.lines.filter((l) => keys.includes(l.key));
  if (lines.length === 0) return null;
  return (
    <Stack spacing={0.75}>
      {lines.map((l) => (
        <Stack key={l.key} spacing={0.25}>
          <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap', rowGap: 0.5 }}>
            <Typography variant="body2" sx={{ fontWeight: 500 }}>
              {l.label}
            </Typography>
            <VerdictChip what={l.label} result={l.result} size="small" against={AGAINST[l.key] ?? 'limit'} />
          </Stack>
          {l.result.verdict !== 'pass' && (
            <Typography variant="body2" color={l.result.verdict === 'fail' ? 'error' : 'text.secondary'}>
              {l.result.note}
            </Typography>
          )}
        </Stack>
      ))}
      <AidLine />
    </Stack>
  );
}

function Group({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Paper variant="outlined" sx={{ p: 1.5 }} component="section" aria-label={title}>
      <Stack spacing={1.5}>
        <Typography variant="h3">{title}</Typography>
        {children}
      </Stack>
    </Paper>
  );
}

/** The readings for one circuit on this visit; each verdict shows as it is typed. */
export function ReadingsForm({ visitId, siteId, circuit, result, earthing, extensions, locked, onSaved }: Props) {
  const draftKey = locked ? null : `readings.${result?.id ?? `new.${visitId}.${circuit.id}`}`;
  const recorded = defaults(result);
  const { register, control, handleSubmit, formState, reset } = useForm<ReadingsValues>({ resolver: zodResolver(readingsSchema), defaultValues: startingValues(draftKey, recorded), mode: 'onChange' });
  const values = useWatch({ control }) as ReadingsValues;
  const draft = useFormDraft(draftKey, values, recorded, reset);
  const [error, setError] = useState<string | null>(null);
  const errors = formState.errors;
  const assessment = useMemo(() => assess(circuit, fromTyped(values), earthing), [circuit, values, earthing]);
  const ring = circuit.kind === 'ring';
  const rcd = circuit.rcdRatingMa != null;
  const predicted = useMemo(() => predictedAfter(extensions, circuit), [extensions, circuit]);
  const radial = useMemo(() => radialExpectation(circuit), [circuit]);
  // Lower than the extension predicts is worth a second look before the readings are trusted.
  const afterExtension = predicted ? checkAgainstExtension({ r1: usableReading(values.r1Ohm), rn: usableReading(values.rnOhm), r2: usableReading(values.r2Ohm) }, predicted) : null;

  // The unit, and the label unless the group around it says the rest, are the catalogue's.
  const reading = (name: (typeof NUMERIC_READINGS)[number], label = circuitReading(name).label) => (
    <TextField
      label={`${label} (${circuitReading(name).unit})`}
      {...register(name)}
      error={!!errors[name]}
      helperText={errors[name]?.message ?? ' '}
      slotProps={{ htmlInput: { inputMode: 'decimal', autoComplete: 'off' } }}
    />
  );

  async function save(v: ReadingsValues) {
    setError(null);
    const final = assess(circuit, fromTyped(v), earthing);
    const fields: Record<string, FieldValue> = {
      ...storedReadings(v),
      instrument: v.instrument.trim() || null,
      verdicts: verdictSummary(final) as unknown as FieldValue,
      testedAt: new Date().toISOString(),
    };
    try {
      if (result) await saveRecord('testResult', result.id, fields);
      else await createRecord('testResult', { visitId, siteId, circuitId: circuit.id, ...(Object.fromEntries(Object.entries(fields).filter(([, x]) => x !== null)) as Fields) });
      draft.settle();
      onSaved();
    } catch (err) {
      setError((err as Error).message);
    }
  }

  const toggle = (name: 'polarity' | 'rcdButton' | 'afddButton', label: string, options: [string, string][]) => (
    <Controller
      control={control}
      name={name}
      render={({ field }) => (
        <ToggleButtonGroup exclusive fullWidth value={field.value} onChange={(_, x) => field.onChange(x ?? '')} aria-label={label} disabled={locked}>
          {options.map(([value, words]) => (
            <ToggleButton key={value} value={value}>
              {words}
            </ToggleButton>
          ))}
        </ToggleButtonGroup>
      )}
    />
  );

  return (
    <Box component="form" aria-label={`Readings for circuit ${circuit.number}`} noValidate onSubmit={handleSubmit(save)}>
      <Box component="fieldset" disabled={locked} sx={{ border: 0, p: 0, m: 0, minWidth: 0 }}>
        <Stack spacing={2}>
          <DraftNotice draft={draft} />
          {ring && (
            <Group title="Ring continuity, end to end">
              <Stack direction="row" spacing={1}>
                {reading('r1Ohm')}
                {reading('rnOhm')}
                {reading('r2Ohm')}
              </Stack>
              {predicted && (
                <Typography variant="body2" color="text.secondary">
                  Predicted after this visit’s extension: r1 {ohms(predicted.r1)}, rn {ohms(predicted.rn)}, r2 {ohms(predicted.r2)}.
                </Typography>
              )}
              {afterExtension?.verdict === 'check' && afterExtension.value !== null && (
                <Stack spacing={0.25} role="status" aria-label="Readings against the extension">
                  <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap', rowGap: 0.5 }}>
                    <Typography variant="body2" sx={{ fontWeight: 500 }}>
                      Against the extension
                    </Typography>
                    <VerdictChip what="Readings against the extension" result={afterExtension} size="small" against="expected" />
                  </Stack>
                  <Typography variant="body2" color="text.secondary">
                    {afterExtension.note}
                  </Typography>
                </Stack>
              )}
              {assessment.ring?.expectedR1R2 != null && (
                <Typography variant="body2">
                  Expect R1+R2 at the furthest point: (r1 + r2) / 4 = {roundTo(assessment.ring.expectedR1R2, 2).toFixed(2)} Ω
                </Typography>
              )}
              <Verdicts assessment={assessment} keys={['ring-r1-rn', 'ring-r2']} />
            </Group>
          )}
          <Group title="Protective conductor">
            <Stack direction="row" spacing={1}>
              {reading('r1r2Ohm')}
              {reading('r2LeadOhm', 'or R2, long lead')}
            </Stack>
            {radial && <Typography variant="body2">{radial}</Typography>}
            <Verdicts assessment={assessment} keys={['r1r2']} />
          </Group>
          <Group title="Insulation resistance">
            <Controller
              control={control}
              name="irTestVoltageV"
              render={({ field }) => (
                <TextField select label="Test voltage" {...field} slotProps={{ select: { native: true }, inputLabel: { shrink: true } }}>
                  <option value="">Not recorded</option>
                  {INSULATION_TEST_VOLTAGES.map((v) => (
                    <option key={v} value={v}>
                      {v} V DC
                    </option>
                  ))}
                </TextField>
              )}
            />
            <Stack direction="row" spacing={1}>
              {reading('irLiveLiveMOhm', 'Live to live')}
              {reading('irLiveEarthMOhm', 'Live to earth')}
            </Stack>
            <Verdicts assessment={assessment} keys={['ir-live-live', 'ir-live-earth']} />
          </Group>
          <Group title="Polarity">
            {toggle('polarity', 'Polarity', [
              ['correct', 'Correct'],
              ['incorrect', 'Incorrect'],
            ])}
            <Verdicts assessment={assessment} keys={['polarity']} />
          </Group>
          <Group title="Earth fault loop impedance">
            {reading('zsOhm', 'Measured Zs')}
            <Verdicts assessment={assessment} keys={['zs']} />
          </Group>
          {rcd && (
            <Group title={`RCD, ${circuit.rcdRatingMa} mA`}>
              <Stack direction="row" spacing={1}>
                {reading('rcdTripMs', `Time at ${circuit.rcdRatingMa} mA`)}
                {reading('rcdTripMs5x', 'At 5 ×, optional')}
              </Stack>
              {toggle('rcdButton', 'RCD test button', [
                ['operates', 'Test button trips it'],
                ['fails', 'Does not trip'],
              ])}
              <Verdicts assessment={assessment} keys={['rcd-1x', 'rcd-5x', 'rcd-button']} />
            </Group>
          )}
          {circuit.afddStandard && (
            <Group title="AFDD">
              {toggle('afddButton', 'AFDD test button', [
                ['operates', 'Test button trips it'],
                ['fails', 'Does not trip'],
              ])}
              <Verdicts assessment={assessment} keys={['afdd-button']} />
            </Group>
          )}
          <TextField label="Instrument" placeholder="Make, model and serial" {...register('instrument')} error={!!errors.instrument} helperText={errors.instrument?.message ?? ' '} />
          <Paper variant="outlined" sx={{ p: 1.5 }} role="status" aria-label="Circuit summary">
            <Typography sx={{ fontWeight: 500 }}>
              This circuit: {VERDICT_WORDS[assessment.verdict]}
              {assessment.failing.length > 0 ? ` — ${assessment.failing.length} failing` : ''}
            </Typography>
            {assessment.missing.length > 0 && (
              <Typography variant="body2" color="text.secondary">
                Still to record: {assessment.missing.map((l) => l.label).join('; ')}.
              </Typography>
            )}
            <AidLine />
          </Paper>
          <SaveBar error={error} locked={locked} label="Save readings" />
        </Stack>
      </Box>
    </Box>
  );
}
