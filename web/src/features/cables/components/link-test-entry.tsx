import Box from '@mui/material/Box';
import Checkbox from '@mui/material/Checkbox';
import FormControlLabel from '@mui/material/FormControlLabel';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import {
  COPPER_PARAMETERS,
  END_FACE_RESULTS,
  END_FACE_WORDS,
  FIBRE_MODES,
  FIBRE_POLARITY_RESULTS,
  FIBRE_POLARITY_WORDS,
  type FieldValue,
  judgeLinkTest,
  LIMIT_SET_WORDS,
  LIMIT_SETS,
  LINK_TEST_MEDIA,
  LINK_TEST_MEDIUM_WORDS,
  type LinkTestFacts,
  linkTestProblems,
  PAIR_LENGTH_FIELDS,
  parameterWords,
} from '@wiretrail/core';
import { type FormEvent, useMemo, useState } from 'react';
import { DateInput } from '@/components/forms/date-inputs';
import { DraftNotice } from '@/components/forms/draft-notice';
import { startingValues, useFormDraft } from '@/components/forms/form-draft';
import { choicesOf, NativeChoice, SaveBar } from '@/components/forms/phone-inputs';
import { AidLine, VerdictChip } from '@/components/verdicts/verdict-chip';
import { parseReading, readingProblem, readingText } from '@/lib/readings';

const TEXT_FIELDS = ['testerMake', 'testerModel', 'testerSerial', 'adapter'] as const;
const FIBRE_NUMBERS = [
  ['fibreLengthM', 'Fibre length', 'm'],
  ['connectorPairs', 'Mated connector pairs', ''],
  ['splices', 'Splices', ''],
  ['firstWavelengthNm', 'First wavelength', 'nm'],
  ['firstLossDb', 'Loss at the first wavelength', 'dB'],
  ['secondWavelengthNm', 'Second wavelength', 'nm'],
  ['secondLossDb', 'Loss at the second wavelength', 'dB'],
] as const;

/** Every typed figure of the form: the copper parameters' worst values and margins, pair lengths and fibre figures. */
const NUMBER_FIELDS: readonly { field: string; label: string; unit: string }[] = [
  ...COPPER_PARAMETERS.flatMap((p) => [
    ...(p.worst ? [{ field: p.worst, label: `${parameterWords(p.name)} worst value`, unit: p.unit }] : []),
    ...(p.margin ? [{ field: p.margin, label: `${parameterWords(p.name)} margin`, unit: p.unit }] : []),
  ]),
  ...PAIR_LENGTH_FIELDS.map((field) => ({ field, label: `Length of pair ${field.slice(4, 5)},${field.slice(5, 6)}`, unit: 'm' })),
  ...FIBRE_NUMBERS.map(([field, label, unit]) => ({ field, label, unit })),
];

export interface LinkTestForm {
  text: Record<string, string>;
  withinAccuracy: string[];
}

function formOf(t: LinkTestFacts | null, defaultMedium: 'copper' | 'fibre'): LinkTestForm {
  const text: Record<string, string> = {
    medium: t?.medium ?? defaultMedium,
    limitSet: t?.limitSet ?? '',
    calibratedOn: t?.calibratedOn ?? '',
    fibreMode: t?.fibreMode ?? '',
    polarity: t?.polarity ?? '',
    endFaces: t?.endFaces ?? '',
  };
  for (const f of TEXT_FIELDS) text[f] = t?.[f] ?? '';
  for (const { field } of NUMBER_FIELDS) text[field] = readingText(t?.[field as keyof LinkTestFacts] as number | null | undefined);
  return { text, withinAccuracy: [...(t?.withinAccuracy ?? [])] };
}

/** The form as the record's fields: blank is null, figures are numbers (a malformed one is refused before this). */
export function fieldsOf(form: LinkTestForm): Record<string, FieldValue> {
  const t = form.text;
  const copper = t.medium === 'copper';
  const fields: Record<string, FieldValue> = { medium: t.medium ?? 'copper', calibratedOn: t.calibratedOn || null, withinAccuracy: copper && form.withinAccuracy.length ? form.withinAccuracy : null };
  for (const f of TEXT_FIELDS) fields[f] = t[f]?.trim() || null;
  fields.limitSet = copper ? t.limitSet || null : null;
  for (const f of ['fibreMode', 'polarity', 'endFaces']) fields[f] = copper ? null : t[f] || null;
  for (const { field } of NUMBER_FIELDS) {
    const isFibre = FIBRE_NUMBERS.some(([f]) => f === field);
    const v = parseReading(t[field]);
    fields[field] = isFibre === copper || v === null || Number.isNaN(v) ? null : v;
  }
  return fields;
}

interface Props {
  /** The cable's label, for the form's name. */
  cableLabel: string;
  /** A fibre cable starts as a fibre test. */
  defaultMedium: 'copper' | 'fibre';
  recorded: LinkTestFacts | null;
  /** Where the phone keeps what is typed until it is saved; null at the desk, whose dialog is one sitting. */
  draftKey: string | null;
  locked: boolean;
  saveLabel: string;
  onSave: (fields: Record<string, FieldValue>) => Promise<void>;
}

/**
 * A link's performance results as a field tester reports them, typed in cards that fit a phone: the limit set and
 * the tester, then each parameter's worst value and margin; or for fibre the loss budget's figures, the losses,
 * polarity and the end faces. Core judges it as it is typed, as the server does again.
 */
export function LinkTestEntry({ cableLabel, defaultMedium, recorded, draftKey, locked, saveLabel, onSave }: Props) {
  const start = useMemo(() => formOf(recorded, defaultMedium), [recorded, defaultMedium]);
  const [form, setForm] = useState<LinkTestForm>(() => startingValues(draftKey, start));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [error, setError] = useState<string | null>(null);
  const draft = useFormDraft(draftKey, form, start, (r) => setForm(r));
  const t = form.text;
  const copper = t.medium === 'copper';
  const set = (field: string) => (value: string) => setForm((f) => ({ ...f, text: { ...f.text, [field]: value } }));
  const judged = useMemo(() => {
    try {
      return judgeLinkTest(fieldsOf(form) as LinkTestFacts);
    } catch {
      // A figure core cannot take yet (half typed): the save names it.
      return null;
    }
  }, [form]);

  async function save(e: FormEvent) {
    e.preventDefault();
    const found: Record<string, string> = {};
    for (const { field, label, unit } of NUMBER_FIELDS) {
      const problem = readingProblem('linkTest', field, t[field] ?? '', label, unit);
      if (problem) found[field] = problem;
    }
    const fields = fieldsOf(form);
    if (!Object.keys(found).length) for (const p of linkTestProblems(fields as LinkTestFacts)) found[p.field] ??= p.message;
    setErrors(found);
    if (Object.keys(found).length) {
      setError(`Not saved: ${Object.values(found)[0]}`);
      return;
    }
    setError(null);
    try {
      await onSave(fields);
      draft.settle();
    } catch (err) {
      setError((err as Error).message);
    }
  }

  const numberInput = (field: string, label: string, unit: string) => (
    <TextField
      key={field}
      label={unit ? `${label} (${unit})` : label}
      value={t[field] ?? ''}
      onChange={(e) => set(field)(e.target.value)}
      error={!!errors[field]}
      helperText={errors[field]}
      slotProps={{ htmlInput: { inputMode: 'decimal' } }}
      fullWidth
    />
  );
  const checkOf = (name: string) => judged?.checks.find((c) => c.name === name);

  return (
    <Box component="form" aria-label={`Performance results of ${cableLabel}`} noValidate onSubmit={save}>
      <Box component="fieldset" disabled={locked} sx={{ border: 0, p: 0, m: 0, minWidth: 0 }}>
        <Stack spacing={2}>
          <DraftNotice draft={draft} />
          <Paper variant="outlined" sx={{ p: 1.5 }} component="section" aria-label="What it was tested to">
            <Stack spacing={1.5}>
              <Typography variant="h3">What it was tested to</Typography>
              <NativeChoice label="Link" value={t.medium} onChange={(e) => set('medium')(e.target.value)} options={choicesOf(LINK_TEST_MEDIA, LINK_TEST_MEDIUM_WORDS)} />
              {copper && (
                <NativeChoice
                  label="Limit set"
                  value={t.limitSet}
                  onChange={(e) => set('limitSet')(e.target.value)}
                  emptyLabel="Choose the limit set…"
                  options={choicesOf(LIMIT_SETS, LIMIT_SET_WORDS)}
                  error={!!errors.limitSet}
                  helperText={errors.limitSet ?? 'The standard, category or class, and permanent link or channel, as set on the tester.'}
                />
              )}
            </Stack>
          </Paper>
          <Paper variant="outlined" sx={{ p: 1.5 }} component="section" aria-label="Tester">
            <Stack spacing={1.5}>
              <Typography variant="h3">Tester</Typography>
              <TextField label="Make" value={t.testerMake} onChange={(e) => set('testerMake')(e.target.value)} slotProps={{ htmlInput: { maxLength: 100 } }} />
              <TextField label="Model" value={t.testerModel} onChange={(e) => set('testerModel')(e.target.value)} slotProps={{ htmlInput: { maxLength: 100 } }} />
              <TextField label="Serial number" value={t.testerSerial} onChange={(e) => set('testerSerial')(e.target.value)} slotProps={{ htmlInput: { maxLength: 100 } }} />
              <DateInput label="Calibrated on" value={t.calibratedOn ?? ''} onChange={set('calibratedOn')} error={!!errors.calibratedOn} helperText={errors.calibratedOn} />
              <TextField label="Adapter used" value={t.adapter} onChange={(e) => set('adapter')(e.target.value)} slotProps={{ htmlInput: { maxLength: 100 } }} />
            </Stack>
          </Paper>
          {copper ? (
            <>
              {COPPER_PARAMETERS.map((p) => {
                const check = checkOf(p.name);
                const words = parameterWords(p.name);
                return (
                  <Paper key={p.name} variant="outlined" sx={{ p: 1.5 }} component="section" aria-label={words}>
                    <Stack spacing={1}>
                      <Stack direction="row" sx={{ justifyContent: 'space-between', alignItems: 'center', gap: 1 }}>
                        <Typography variant="h3">{words}</Typography>
                        {check && <VerdictChip what={words} result={check} />}
                      </Stack>
                      <Stack direction="row" spacing={1}>
                        {p.worst && numberInput(p.worst, p.margin ? 'Worst' : 'Value', p.unit)}
                        {p.margin && numberInput(p.margin, 'Margin', p.unit)}
                      </Stack>
                      <FormControlLabel
                        control={
                          <Checkbox
                            checked={form.withinAccuracy.includes(p.name)}
                            onChange={(e) =>
                              setForm((f) => ({ ...f, withinAccuracy: e.target.checked ? [...f.withinAccuracy, p.name] : f.withinAccuracy.filter((n) => n !== p.name) }))
                            }
                          />
                        }
                        label="Within the tester’s accuracy"
                      />
                    </Stack>
                  </Paper>
                );
              })}
              <Paper variant="outlined" sx={{ p: 1.5 }} component="section" aria-label="Length per pair">
                <Stack spacing={1}>
                  <Stack direction="row" sx={{ justifyContent: 'space-between', alignItems: 'center', gap: 1 }}>
                    <Typography variant="h3">Length per pair</Typography>
                    {checkOf('pairLength') && <VerdictChip what="Length per pair" result={checkOf('pairLength')!} />}
                  </Stack>
                  <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr', gap: 1 }}>
                    {NUMBER_FIELDS.filter((n) => (PAIR_LENGTH_FIELDS as readonly string[]).includes(n.field)).map((n) => numberInput(n.field, `Pair ${n.field.slice(4, 5)},${n.field.slice(5, 6)}`, 'm'))}
                  </Box>
                </Stack>
              </Paper>
            </>
          ) : (
            <Paper variant="outlined" sx={{ p: 1.5 }} component="section" aria-label="Fibre loss">
              <Stack spacing={1.5}>
                <Typography variant="h3">Fibre loss (Tier 1)</Typography>
                <NativeChoice
                  label="Fibre"
                  value={t.fibreMode}
                  onChange={(e) => set('fibreMode')(e.target.value)}
                  emptyLabel="Choose…"
                  options={choicesOf(FIBRE_MODES, { multimode: 'Multimode', singlemode: 'Single-mode' })}
                  error={!!errors.fibreMode}
                  helperText={errors.fibreMode}
                />
                {FIBRE_NUMBERS.map(([field, label, unit]) => numberInput(field, label, unit))}
                {judged?.checks.map((c) => (
                  <Stack key={c.name} direction="row" spacing={1} sx={{ alignItems: 'center' }}>
                    <Typography variant="body2" sx={{ fontWeight: 500 }}>
                      {c.name}
                    </Typography>
                    <VerdictChip what={c.name} result={c} />
                  </Stack>
                ))}
                <NativeChoice label="Polarity" value={t.polarity} onChange={(e) => set('polarity')(e.target.value)} emptyLabel="Not checked" options={choicesOf(FIBRE_POLARITY_RESULTS, FIBRE_POLARITY_WORDS)} />
                <NativeChoice label="End faces" value={t.endFaces} onChange={(e) => set('endFaces')(e.target.value)} emptyLabel="Not inspected" options={choicesOf(END_FACE_RESULTS, END_FACE_WORDS)} />
              </Stack>
            </Paper>
          )}
          {judged && (
            <Stack spacing={0.5} role="status" aria-label="Overall result">
              <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
                <Typography sx={{ fontWeight: 500 }}>Overall</Typography>
                <VerdictChip verdict={judged.verdict} />
              </Stack>
              {judged.anyWithinAccuracy && (
                <Typography variant="body2" color="text.secondary">
                  “Within the tester’s accuracy” is our own term: the tester could not tell the result from the limit. The report says so beside it.
                </Typography>
              )}
              <AidLine />
            </Stack>
          )}
          <SaveBar error={error} locked={locked} label={saveLabel} />
        </Stack>
      </Box>
    </Box>
  );
}
