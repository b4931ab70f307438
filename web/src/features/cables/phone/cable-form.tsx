import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Checkbox from '@mui/material/Checkbox';
import FormControlLabel from '@mui/material/FormControlLabel';
import Divider from '@mui/material/Divider';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import {
  assessCableRun,
  BS6701_MINIMUM_FIRE_CLASS,
  CABLE_FIRE_CLASSES,
  CABLE_MEDIA,
  DATA_CABLE_KINDS,
  meetsFireMinimum,
  POWER_CABLE_KINDS,
  SEGREGATION_CONTAINMENTS,
  segregationMm,
  CABLE_STATUSES,
  type FieldValue,
  isTwistedPair,
  LINK_KINDS,
  roundTo,
  readTdr,
  TRACE_METHODS,
} from '@wiretrail/core';
import { useMemo, useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { v7 as uuidv7 } from 'uuid';
import { z } from 'zod';
import { DraftNotice } from '@/components/forms/draft-notice';
import { startingValues, useFormDraft } from '@/components/forms/form-draft';
import { choicesOf, NativeChoice, SaveBar } from '@/components/forms/phone-inputs';
import type { AreaRow, CableRunRow } from '@/lib/db';
import { parseReading, readingField, readingText, usableReading } from '@/lib/readings';
import { createRecords, type Fields, saveRecord } from '@/lib/sync/local-write';
import { CABLE_STATUS_WORDS, LINK_KIND_WORDS, MEDIUM_WORDS, TERMINATIONS, TRACE_METHOD_WORDS } from '../cable-words';
import { CableVerdicts } from './cable-verdicts';
import { readWiremap, type Wiremap, WiremapEntry } from './wiremap-entry';

export const NEW_AREA = '__new';

/** NVP as a fraction of c; "69" or "69 %" is read as 0.69, the way datasheets often print it. */
export function parseNvp(text: string): number | null {
  const value = parseReading(text.replace('%', ''));
  if (value === null || Number.isNaN(value) || value <= 1) return value;
  // Real cables are 50–99 % of c; a figure like 1.5 is neither a fraction nor a percentage.
  return value >= 10 && value <= 100 ? roundTo(value / 100, 4) : Number.NaN;
}

const max = (n: number, what: string) => z.string().max(n, `${what} must be at most ${n} characters.`);

export const cableSchema = z
  .object({
    label: z.string().trim().min(1, 'Give the cable a label, for example RC-03.').max(100, 'The label must be at most 100 characters.'),
    medium: z.enum(CABLE_MEDIA),
    endAAreaId: z.string(),
    endANewArea: max(200, "The new area's name for end A"),
    endADescription: max(300, 'The description of end A'),
    endATermination: max(100, 'The termination of end A'),
    endBAreaId: z.string(),
    endBNewArea: max(200, "The new area's name for end B"),
    endBDescription: max(300, 'The description of end B'),
    endBTermination: max(100, 'The termination of end B'),
    traceMethod: z.enum(['', ...TRACE_METHODS]),
    status: z.enum(CABLE_STATUSES),
    scheme: z.enum(['T568A', 'T568B']),
    lengthMode: z.enum(['typed', 'tdr']),
    lengthM: readingField('cableRun', 'lengthM', 'The length', 'm'),
    tdrNs: readingField('cableRun', 'tdrNs', 'The TDR time', 'ns'),
    nvp: z.string(),
    linkKind: z.enum(LINK_KINDS),
    fireClass: z.enum(['', ...CABLE_FIRE_CLASSES]),
    besidePower: z.boolean(),
    powerCableKind: z.enum(POWER_CABLE_KINDS),
    dataCableKind: z.enum(DATA_CABLE_KINDS),
    containment: z.enum(SEGREGATION_CONTAINMENTS),
    parallelRunM: readingField('cableRun', 'parallelRunM', 'The length side by side', 'm'),
  })
  .superRefine((v, ctx) => {
    for (const e of ['A', 'B'] as const) {
      const area = v[`end${e}AreaId` as const];
      if (area === NEW_AREA && !v[`end${e}NewArea` as const].trim()) {
        ctx.addIssue({ code: 'custom', path: [`end${e}NewArea`], message: `Name the new area for end ${e}, for example "Loft".` });
      }
    }
    if (v.lengthMode === 'tdr') {
      const tdr = tdrOf(v);
      if (tdr.problem && tdr.field === 'nvp') ctx.addIssue({ code: 'custom', path: ['nvp'], message: tdr.problem });
      // A round trip that gives a length no building holds is a misread figure, not a cable that fails.
      else if (tdr.problem) ctx.addIssue({ code: 'custom', path: ['tdrNs'], message: tdr.problem });
      if ((v.tdrNs.trim() === '') !== (v.nvp.trim() === '')) {
        ctx.addIssue({ code: 'custom', path: [v.tdrNs.trim() === '' ? 'tdrNs' : 'nvp'], message: 'Enter both the TDR time and the NVP to work out the length.' });
      }
    }
  });

export type CableValues = z.infer<typeof cableSchema>;

function defaults(cable: CableRunRow | null): CableValues {
  return {
    label: cable?.label ?? '',
    medium: cable?.medium ?? 'Cat6',
    endAAreaId: cable?.endAAreaId ?? '',
    endANewArea: '',
    endADescription: cable?.endADescription ?? '',
    endATermination: cable?.endATermination ?? '',
    endBAreaId: cable?.endBAreaId ?? '',
    endBNewArea: '',
    endBDescription: cable?.endBDescription ?? '',
    endBTermination: cable?.endBTermination ?? '',
    traceMethod: cable?.traceMethod ?? '',
    status: cable?.status ?? 'unidentified',
    scheme: cable?.scheme ?? 'T568B',
    lengthMode: cable?.tdrNs != null ? 'tdr' : 'typed',
    lengthM: readingText(cable?.lengthM),
    tdrNs: readingText(cable?.tdrNs),
    nvp: readingText(cable?.nvp),
    linkKind: cable?.linkKind ?? 'permanent-link',
    fireClass: cable?.fireClass ?? '',
    besidePower: cable?.besidePower ?? false,
    powerCableKind: cable?.powerCableKind ?? 'unscreened',
    dataCableKind: cable?.dataCableKind ?? (cable?.medium === 'fibre' ? 'fibre' : cable?.medium === 'coax' ? 'coax' : 'unscreened-twisted-pair'),
    containment: cable?.containment ?? 'none',
    parallelRunM: readingText(cable?.parallelRunM),
  };
}

/** The separation a data run beside power needs, or null until the length side by side is typed. */
export function separationFor(v: Pick<CableValues, 'besidePower' | 'powerCableKind' | 'dataCableKind' | 'containment' | 'parallelRunM'>) {
  const run = usableReading(v.parallelRunM);
  return v.besidePower && run !== null ? segregationMm({ powerCableKind: v.powerCableKind, dataCableKind: v.dataCableKind, containment: v.containment, parallelRunM: run }) : null;
}

export const POWER_WORDS: Record<(typeof POWER_CABLE_KINDS)[number], string> = { unscreened: 'Unscreened (twin and earth, flex)', screened: 'Screened or armoured' };
export const DATA_KIND_WORDS: Record<(typeof DATA_CABLE_KINDS)[number], string> = {
  'unscreened-twisted-pair': 'Unscreened twisted pair (U/UTP)',
  'screened-twisted-pair': 'Screened twisted pair (F/UTP, S/FTP)',
  coax: 'Coax',
  fibre: 'Fibre (all-dielectric)',
};
export const CONTAINMENT_WORDS: Record<(typeof SEGREGATION_CONTAINMENTS)[number], string> = {
  none: 'None between them',
  'open-metallic': 'Open metal tray',
  'perforated-metallic': 'Perforated metal tray',
  'solid-metallic': 'Solid metal divider or trunking',
};

/** The TDR figures as core reads them: an NVP that is neither a fraction nor a percentage is named as typed. */
function tdrOf(v: Pick<CableValues, 'tdrNs' | 'nvp'>) {
  const nvp = parseNvp(v.nvp);
  return readTdr({ nanoseconds: usableReading(v.tdrNs), nvp: nvp !== null && Number.isNaN(nvp) ? parseReading(v.nvp.replace('%', '')) : nvp });
}

/** The length the form stands for: typed, or worked out from the TDR's round trip and the cable's NVP. */
export function lengthFrom(v: Pick<CableValues, 'lengthMode' | 'lengthM' | 'tdrNs' | 'nvp'>): number | null {
  if (v.lengthMode === 'typed') return usableReading(v.lengthM);
  const { lengthM } = tdrOf(v);
  return lengthM === null ? null : roundTo(lengthM, 2);
}

interface Props {
  siteId: string;
  visitId: string;
  cable: CableRunRow | null;
  areas: AreaRow[];
  locked: boolean;
  onSaved: (id: string, label: string) => void;
}

/** Record a cable run: where each end is, how it was identified and terminated, its wiremap and length. */
export function CableForm({ siteId, visitId, cable, areas, locked, onSaved }: Props) {
  const draftKey = locked ? null : `cable.${cable?.id ?? `new.${visitId}`}`;
  const recorded = { ...defaults(cable), wiremap: readWiremap(cable?.wiremap) };
  const { wiremap: startWiremap, ...start } = startingValues(draftKey, recorded);
  const { register, control, handleSubmit, formState, reset } = useForm<CableValues>({ resolver: zodResolver(cableSchema), defaultValues: start });
  const [wiremap, setWiremap] = useState<Wiremap | null>(() => readWiremap(startWiremap));
  const [error, setError] = useState<string | null>(null);
  const values = useWatch({ control }) as CableValues;
  const draft = useFormDraft(draftKey, { ...values, wiremap }, recorded, ({ wiremap: w, ...v }) => {
    reset(v);
    setWiremap(w);
  });
  const twisted = isTwistedPair(values.medium);
  const lengthM = lengthFrom(values);
  const assessment = useMemo(
    () => assessCableRun({ medium: values.medium, scheme: twisted ? values.scheme : null, wiremap: twisted ? wiremap : null, lengthM, linkKind: values.linkKind }),
    [values.medium, values.scheme, values.linkKind, twisted, wiremap, lengthM],
  );
  const errors = formState.errors as Record<string, { message?: string } | undefined>;
  const separation = useMemo(() => {
    try {
      return separationFor(values);
    } catch {
      return null;
    }
  }, [values]);
  const areaName = (e: 'A' | 'B') => {
    const id = values[`end${e}AreaId` as const];
    return areas.find((a) => a.id === id)?.name;
  };
  const endNames = { nearEnd: `End A${areaName('A') ? ` (${areaName('A')})` : ''}`, farEnd: `End B${areaName('B') ? ` (${areaName('B')})` : ''}` };

  async function save(v: CableValues) {
    setError(null);
    const areaRows: { entity: 'area'; id: string; fields: Fields }[] = [];
    const areaFor = (e: 'A' | 'B'): string | null => {
      const id = v[`end${e}AreaId` as const];
      if (id !== NEW_AREA) return id || null;
      const newId = uuidv7();
      areaRows.push({ entity: 'area', id: newId, fields: { siteId, name: v[`end${e}NewArea` as const].trim() } });
      return newId;
    };
    const text = (s: string) => s.trim() || null;
    const recorded = assessment.wiremap !== null || lengthM !== null;
    const statusRank = CABLE_STATUSES.indexOf(v.status);
    const fields: Record<string, FieldValue> = {
      label: v.label.trim(),
      medium: v.medium,
      endAAreaId: areaFor('A'),
      endADescription: text(v.endADescription),
      endATermination: text(v.endATermination),
      endBAreaId: areaFor('B'),
      endBDescription: text(v.endBDescription),
      endBTermination: text(v.endBTermination),
      traceMethod: v.traceMethod || null,
      // A wiremap taken means the cable was tested, whatever the status said before.
      status: assessment.wiremap && assessment.wiremap.verdict !== 'check' && statusRank < CABLE_STATUSES.indexOf('tested') ? 'tested' : v.status,
      scheme: twisted ? v.scheme : null,
      wiremap: twisted && wiremap ? (wiremap as unknown as FieldValue) : null,
      lengthM,
      tdrNs: v.lengthMode === 'tdr' ? usableReading(v.tdrNs) : null,
      nvp: v.lengthMode === 'tdr' ? parseNvp(v.nvp) : null,
      linkKind: twisted ? v.linkKind : null,
      fireClass: v.fireClass || null,
      besidePower: v.besidePower,
      powerCableKind: v.besidePower ? v.powerCableKind : null,
      dataCableKind: v.besidePower ? v.dataCableKind : null,
      containment: v.besidePower ? v.containment : null,
      parallelRunM: v.besidePower ? usableReading(v.parallelRunM) : null,
      separationMm: separationFor(v)?.minimumMm ?? null,
      verdict: recorded ? assessment.verdict : null,
      lastVisitId: visitId,
    };
    const changedTest = !cable || JSON.stringify(cable.wiremap ?? null) !== JSON.stringify(fields.wiremap) || (cable.lengthM ?? null) !== lengthM;
    if (recorded && changedTest) fields.testedAt = new Date().toISOString();
    try {
      if (cable) {
        if (areaRows.length) await createRecords(areaRows);
        await saveRecord('cableRun', cable.id, fields);
        draft.settle();
        onSaved(cable.id, fields.label as string);
      } else {
        const id = uuidv7();
        const created = Object.fromEntries(Object.entries({ siteId, ...fields }).filter(([, value]) => value !== null)) as Fields;
        await createRecords([...areaRows, { entity: 'cableRun', id, fields: created }]);
        draft.settle();
        onSaved(id, fields.label as string);
      }
    } catch (err) {
      setError((err as Error).message);
    }
  }

  const select = { select: { native: true }, inputLabel: { shrink: true } };
  return (
    <Box component="form" aria-label={cable ? `Cable ${cable.label}` : 'Record a cable'} noValidate onSubmit={handleSubmit(save)}>
      <Box component="fieldset" disabled={locked} sx={{ border: 0, p: 0, m: 0, minWidth: 0 }}>
        <Stack spacing={2}>
          <DraftNotice draft={draft} />
          <TextField label="Label" {...register('label')} error={!!errors.label} helperText={errors.label?.message ?? 'As written on both ends, e.g. RC-03.'} slotProps={{ htmlInput: { autoCapitalize: 'characters' } }} />
          <NativeChoice label="Medium" {...register('medium')} options={choicesOf(CABLE_MEDIA, MEDIUM_WORDS)} />
          {(['A', 'B'] as const).map((e) => (
            <Paper key={e} variant="outlined" sx={{ p: 1.5 }} component="fieldset" aria-label={`End ${e}`}>
              <Stack spacing={1.5}>
                <Typography variant="h3" component="legend">
                  End {e}
                </Typography>
                <TextField select label={`End ${e} area`} {...register(`end${e}AreaId`)} slotProps={select}>
                  <option value="">Not given</option>
                  {areas.map((a) => (
                    <option key={a.id} value={a.id}>
                      {a.name}
                    </option>
                  ))}
                  <option value={NEW_AREA}>A new area…</option>
                </TextField>
                {values[`end${e}AreaId` as const] === NEW_AREA && (
                  <TextField label={`New area for end ${e}`} {...register(`end${e}NewArea`)} error={!!errors[`end${e}NewArea`]} helperText={errors[`end${e}NewArea`]?.message ?? ' '} />
                )}
                <TextField
                  label={`End ${e} description`}
                  placeholder={e === 'A' ? 'Patch panel port 3' : 'Faceplate behind TV, port 1'}
                  {...register(`end${e}Description`)}
                  error={!!errors[`end${e}Description`]}
                  helperText={errors[`end${e}Description`]?.message}
                />
                <TextField
                  label={`End ${e} termination`}
                  {...register(`end${e}Termination`)}
                  error={!!errors[`end${e}Termination`]}
                  helperText={errors[`end${e}Termination`]?.message}
                  slotProps={{ htmlInput: { list: 'terminations' } }}
                />
              </Stack>
            </Paper>
          ))}
          <datalist id="terminations">
            {TERMINATIONS.map((t) => (
              <option key={t} value={t} />
            ))}
          </datalist>
          <Stack direction="row" spacing={1.5}>
            <NativeChoice label="Identified by" {...register('traceMethod')} emptyLabel="Not yet" options={choicesOf(TRACE_METHODS, TRACE_METHOD_WORDS)} />
            <NativeChoice label="Status" {...register('status')} options={choicesOf(CABLE_STATUSES, CABLE_STATUS_WORDS)} />
          </Stack>
          {twisted && (
            <>
              <Divider />
              <Typography variant="h3">Termination and wiremap</Typography>
              <Controller
                control={control}
                name="scheme"
                render={({ field }) => (
                  <ToggleButtonGroup exclusive fullWidth value={field.value} onChange={(_, s) => s && field.onChange(s)} aria-label="Termination scheme">
                    <ToggleButton value="T568A">T568A</ToggleButton>
                    <ToggleButton value="T568B">T568B</ToggleButton>
                  </ToggleButtonGroup>
                )}
              />
              <WiremapEntry scheme={values.scheme} endNames={endNames} value={wiremap} onChange={setWiremap} disabled={locked} />
            </>
          )}
          <Divider />
          <Typography variant="h3">Length</Typography>
          <Controller
            control={control}
            name="lengthMode"
            render={({ field }) => (
              <ToggleButtonGroup exclusive fullWidth value={field.value} onChange={(_, m) => m && field.onChange(m)} aria-label="How the length was found">
                <ToggleButton value="typed">Measured length</ToggleButton>
                <ToggleButton value="tdr">From a TDR reading</ToggleButton>
              </ToggleButtonGroup>
            )}
          />
          {values.lengthMode === 'typed' ? (
            <TextField label="Length (m)" {...register('lengthM')} error={!!errors.lengthM} helperText={errors.lengthM?.message ?? ' '} slotProps={{ htmlInput: { inputMode: 'decimal' } }} />
          ) : (
            <Stack spacing={1}>
              <Stack direction="row" spacing={1.5}>
                <TextField label="Round trip (ns)" {...register('tdrNs')} error={!!errors.tdrNs} helperText={errors.tdrNs?.message ?? ' '} slotProps={{ htmlInput: { inputMode: 'decimal' } }} />
                <TextField label="NVP" placeholder="0.69" {...register('nvp')} error={!!errors.nvp} helperText={errors.nvp?.message ?? 'From the cable’s datasheet.'} slotProps={{ htmlInput: { inputMode: 'decimal' } }} />
              </Stack>
              <Typography role="status" sx={{ fontWeight: 500 }}>
                {lengthM !== null ? `Length ${lengthM} m (NVP × c × t ÷ 2)` : (tdrOf(values).problem ?? 'Enter the round trip time and the NVP.')}
              </Typography>
            </Stack>
          )}
          {twisted && (
            <NativeChoice label="Measured as" {...register('linkKind')} options={choicesOf(LINK_KINDS, LINK_KIND_WORDS)} />
          )}
          <Divider />
          <Typography variant="h3">Beside power and fire class</Typography>
          <Controller
            control={control}
            name="besidePower"
            render={({ field }) => <FormControlLabel control={<Checkbox checked={field.value} onChange={(e) => field.onChange(e.target.checked)} />} label="Runs beside a power cable" />}
          />
          {values.besidePower && (
            <Stack spacing={1.5}>
              <NativeChoice label="Power cable" {...register('powerCableKind')} options={choicesOf(POWER_CABLE_KINDS, POWER_WORDS)} />
              <NativeChoice label="This data cable" {...register('dataCableKind')} options={choicesOf(DATA_CABLE_KINDS, DATA_KIND_WORDS)} />
              <NativeChoice label="Between them" {...register('containment')} options={choicesOf(SEGREGATION_CONTAINMENTS, CONTAINMENT_WORDS)} />
              <TextField label="Side by side for (m)" {...register('parallelRunM')} error={!!errors.parallelRunM} helperText={errors.parallelRunM?.message ?? ' '} slotProps={{ htmlInput: { inputMode: 'decimal' } }} />
              {separation && (
                <Alert severity={separation.minimumMm > 0 ? 'warning' : 'info'} role="status" aria-label="Separation from power">
                  {separation.minimumMm > 0 ? `Keep at least ${separation.minimumMm} mm from the power cable. ` : 'No separation distance. '}
                  {separation.note} Source: {separation.source}. The regulations in force, local codes and a competent person decide.
                </Alert>
              )}
            </Stack>
          )}
          <NativeChoice
            label="Fire class of the cable"
            {...register('fireClass')}
            emptyLabel="Not recorded"
            options={CABLE_FIRE_CLASSES.map((c) => ({ value: c, label: c }))}
            helperText={
              values.fireClass && !meetsFireMinimum(values.fireClass)
                ? `Below ${BS6701_MINIMUM_FIRE_CLASS.value}, the least for installed cable (${BS6701_MINIMUM_FIRE_CLASS.source}).`
                : `As printed on the cable; at least ${BS6701_MINIMUM_FIRE_CLASS.value} (${BS6701_MINIMUM_FIRE_CLASS.source}).`
            }
            error={!!values.fireClass && !meetsFireMinimum(values.fireClass)}
          />
          <CableVerdicts assessment={assessment} />
          <SaveBar error={error} locked={locked} label={cable ? 'Save cable' : 'Save new cable'} />
        </Stack>
      </Box>
    </Box>
  );
}

