import { zodResolver } from '@hookform/resolvers/zod';
import Box from '@mui/material/Box';
import Divider from '@mui/material/Divider';
import FormControlLabel from '@mui/material/FormControlLabel';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import Typography from '@mui/material/Typography';
import {
  checksBeforeWork,
  extendRing,
  type FieldValue,
  fuseForLoad,
  type FuseChoice,
  INSTALLATION_METHODS,
  InvalidInputError,
  POINT_ACTIONS,
  POINT_CONNECTIONS,
  POINT_LOCATIONS,
  RCD_CIRCUIT_KINDS,
  type RingExtension,
  roundTo,
} from '@wiretrail/core';
import { useEffect, useMemo, useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { DraftNotice } from '@/components/forms/draft-notice';
import { startingValues, useFormDraft } from '@/components/forms/form-draft';
import { choicesOf, NativeChoice, SaveBar } from '@/components/forms/phone-inputs';
import { AidLine, VerdictChip } from '@/components/verdicts/verdict-chip';
import { BeforeWorkChecks } from '@/components/verdicts/before-work-checks';
import type { AreaRow, CircuitRow, PointChangeRow, SiteRow } from '@/lib/db';
import { readingField, readingText, usableReading } from '@/lib/readings';
import { createRecord, type Fields, saveRecord } from '@/lib/sync/local-write';
import type { RingBaseline } from '../data/get-visit-points';
import { ACCESSORIES, ACTION_WORDS, CONNECTION_WORDS, hasFrom, hasTo, LOCATION_WORDS, needsFuse, SUPPLIES_WORDS, suppliesOf } from '../point-words';
import { InstallationMethodPicker } from './installation-method-picker';
import { type ConcealedRoute, newRoute, readRoute, WallDiagram } from './wall-diagram';

const r = (field: string, label: string, unit: string) => readingField('pointChange', field, label, unit);

export const pointSchema = z
  .object({
    action: z.enum(POINT_ACTIONS),
    accessoryKind: z.string().trim().min(1, 'Say what the accessory is, for example "Twin socket-outlet".').max(100, 'The accessory must be at most 100 characters.'),
    circuitId: z.string(),
    connection: z.enum(['', ...POINT_CONNECTIONS]),
    fromAreaId: z.string(),
    fromDescription: z.string().max(300, 'Where it was must be at most 300 characters.'),
    fromHeightMm: r('fromHeightMm', 'The height it was at', 'mm'),
    toAreaId: z.string(),
    toDescription: z.string().max(300, 'Where it is must be at most 300 characters.'),
    toHeightMm: r('toHeightMm', 'The height it is at', 'mm'),
    liveCsaMm2: r('liveCsaMm2', 'The live conductor size', 'mm²'),
    cpcCsaMm2: r('cpcCsaMm2', 'The cpc size', 'mm²'),
    addedRouteM: r('addedRouteM', 'The cable added to the ring', 'm'),
    beforeR1Ohm: r('beforeR1Ohm', 'r1 before', 'Ω'),
    beforeRnOhm: r('beforeRnOhm', 'rn before', 'Ω'),
    beforeR2Ohm: r('beforeR2Ohm', 'r2 before', 'Ω'),
    loadW: r('loadW', 'The load', 'W'),
    supplies: z.enum(['', ...RCD_CIRCUIT_KINDS]),
    location: z.enum(POINT_LOCATIONS),
    dwelling: z.boolean(),
    joinR1R2Ohm: r('joinR1R2Ohm', 'R1+R2 where it joins', 'Ω'),
    ringPoints: r('ringPoints', 'The points on the ring', ''),
    ringUnfusedSpurs: r('ringUnfusedSpurs', 'The unfused spurs', ''),
    spurFeeds: r('spurFeeds', 'What this spur feeds', ''),
    spurFromSpur: z.boolean(),
    designCurrentA: r('designCurrentA', 'The design current', 'A'),
    installationMethod: z.enum(['', ...INSTALLATION_METHODS]),
    ambientFactor: r('ambientFactor', 'The ambient factor Ca', ''),
    groupingFactor: r('groupingFactor', 'The grouping factor Cg', ''),
    insulationFactor: r('insulationFactor', 'The insulation factor Ci', ''),
  })
  .superRefine((v, ctx) => {
    const issue = (path: string, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
    if (hasTo(v.action) && !v.toAreaId && !v.toDescription.trim()) issue('toDescription', 'Say where the point is now: pick the area or describe the place.');
    if (hasFrom(v.action) && !v.fromAreaId && !v.fromDescription.trim()) issue('fromDescription', 'Say where the point was: pick the area or describe the place.');
    if (v.connection === 'ring-extension') {
      if (!v.circuitId) issue('circuitId', 'Pick the ring this point was added to.');
      if (v.addedRouteM.trim() === '') issue('addedRouteM', 'Enter the cable added to the ring, out to the point and back.');
    }
  });

export type PointValues = z.infer<typeof pointSchema>;

function defaults(point: PointChangeRow | null): PointValues {
  return {
    action: point?.action ?? 'move',
    accessoryKind: point?.accessoryKind ?? '',
    circuitId: point?.circuitId ?? '',
    connection: point?.connection ?? '',
    fromAreaId: point?.fromAreaId ?? '',
    fromDescription: point?.fromDescription ?? '',
    fromHeightMm: readingText(point?.fromHeightMm),
    toAreaId: point?.toAreaId ?? '',
    toDescription: point?.toDescription ?? '',
    toHeightMm: readingText(point?.toHeightMm),
    liveCsaMm2: readingText(point?.liveCsaMm2),
    cpcCsaMm2: readingText(point?.cpcCsaMm2),
    addedRouteM: readingText(point?.addedRouteM),
    beforeR1Ohm: readingText(point?.beforeR1Ohm),
    beforeRnOhm: readingText(point?.beforeRnOhm),
    beforeR2Ohm: readingText(point?.beforeR2Ohm),
    loadW: readingText(point?.loadW),
    supplies: (point?.supplies as PointValues['supplies'] | null | undefined) ?? suppliesOf(point?.accessoryKind ?? ''),
    location: (point?.location as PointValues['location'] | null | undefined) ?? 'indoors',
    dwelling: point?.dwelling ?? true,
    joinR1R2Ohm: readingText(point?.joinR1R2Ohm),
    ringPoints: readingText(point?.ringPoints),
    ringUnfusedSpurs: readingText(point?.ringUnfusedSpurs),
    spurFeeds: readingText(point?.spurFeeds),
    spurFromSpur: point?.spurFromSpur ?? false,
    designCurrentA: readingText(point?.designCurrentA),
    installationMethod: (point?.installationMethod as PointValues['installationMethod'] | null | undefined) ?? '',
    ambientFactor: readingText(point?.ambientFactor),
    groupingFactor: readingText(point?.groupingFactor),
    insulationFactor: readingText(point?.insulationFactor),
  };
}

/** The row the form would save: what is stored, and what the checks before the work are worked out from. */
export function pointFields(values: PointValues, route: ConcealedRoute | null, fuse: FuseChoice | null): Record<string, FieldValue> {
  const text = (s: string) => s.trim() || null;
  const fused = needsFuse(values.connection, values.accessoryKind);
  const ring = values.connection === 'ring-extension';
  const spur = values.connection === 'unfused-spur';
  const joined = values.connection === 'unfused-spur' || values.connection === 'fused-spur' || values.connection === 'radial';
  const newRun = values.installationMethod !== '';
  return {
    action: values.action,
    accessoryKind: values.accessoryKind.trim(),
    circuitId: values.circuitId || null,
    connection: values.connection || null,
    fromAreaId: hasFrom(values.action) ? values.fromAreaId || null : null,
    fromDescription: hasFrom(values.action) ? text(values.fromDescription) : null,
    fromHeightMm: hasFrom(values.action) ? usableReading(values.fromHeightMm) : null,
    toAreaId: hasTo(values.action) ? values.toAreaId || null : null,
    toDescription: hasTo(values.action) ? text(values.toDescription) : null,
    toHeightMm: hasTo(values.action) ? usableReading(values.toHeightMm) : null,
    liveCsaMm2: usableReading(values.liveCsaMm2),
    cpcCsaMm2: usableReading(values.cpcCsaMm2),
    addedRouteM: ring || joined ? usableReading(values.addedRouteM) : null,
    beforeR1Ohm: ring ? usableReading(values.beforeR1Ohm) : null,
    beforeRnOhm: ring ? usableReading(values.beforeRnOhm) : null,
    beforeR2Ohm: ring ? usableReading(values.beforeR2Ohm) : null,
    loadW: fused ? usableReading(values.loadW) : null,
    fuseRatingA: fused ? (fuse?.fuseRatingA ?? null) : null,
    concealedRoute: route && route.route.length > 1 ? (route as unknown as FieldValue) : null,
    supplies: values.supplies || null,
    location: values.location,
    dwelling: values.dwelling,
    joinR1R2Ohm: joined ? usableReading(values.joinR1R2Ohm) : null,
    ringPoints: spur ? usableReading(values.ringPoints) : null,
    ringUnfusedSpurs: spur ? usableReading(values.ringUnfusedSpurs) : null,
    spurFeeds: spur ? usableReading(values.spurFeeds) : null,
    spurFromSpur: spur ? values.spurFromSpur : null,
    designCurrentA: newRun ? usableReading(values.designCurrentA) : null,
    installationMethod: values.installationMethod || null,
    ambientFactor: newRun ? usableReading(values.ambientFactor) : null,
    groupingFactor: newRun ? usableReading(values.groupingFactor) : null,
    insulationFactor: newRun ? usableReading(values.insulationFactor) : null,
  };
}

/** What an extension will do to the ring's end-to-end readings, or why it cannot be worked out yet. */
export type ExtensionPrediction = { prediction: RingExtension; waiting?: undefined } | { prediction?: undefined; waiting: string };

export function predictExtension(v: Pick<PointValues, 'beforeR1Ohm' | 'beforeRnOhm' | 'beforeR2Ohm' | 'liveCsaMm2' | 'cpcCsaMm2' | 'addedRouteM'>): ExtensionPrediction {
  const [r1, rn, r2, live, cpc, added] = [v.beforeR1Ohm, v.beforeRnOhm, v.beforeR2Ohm, v.liveCsaMm2, v.cpcCsaMm2, v.addedRouteM].map(usableReading);
  if (r1 == null || rn == null || r2 == null) return { waiting: 'Enter the ring’s end-to-end r1, rn and r2 from before you broke into it.' };
  if (live == null || cpc == null) return { waiting: 'Enter the live and cpc sizes of the cable added.' };
  if (added == null) return { waiting: 'Enter the length of cable added to the ring.' };
  try {
    return { prediction: extendRing({ r1, rn, r2, liveCsaMm2: live, cpcCsaMm2: cpc, addedRouteM: added }) };
  } catch (err) {
    if (err instanceof InvalidInputError) return { waiting: `Cannot work this out: ${err.message}.` };
    throw err;
  }
}

const ohms = (v: number) => `${roundTo(v, 2).toFixed(2)} Ω`;

interface Props {
  visitId: string;
  siteId: string;
  point: PointChangeRow | null;
  circuits: CircuitRow[];
  areas: AreaRow[];
  ringBaselines: Map<string, RingBaseline>;
  /** For its Ze and earthing, which the predicted Zs needs. */
  site: SiteRow | null;
  locked: boolean;
  onSaved: (id: string) => void;
}

/** A point added, moved, taken out or replaced: where from and to, and how it joins its circuit. */
export function PointForm({ visitId, siteId, point, circuits, areas, ringBaselines, site, locked, onSaved }: Props) {
  const draftKey = locked ? null : `point.${point?.id ?? `new.${visitId}`}`;
  const recorded = { ...defaults(point), route: readRoute(point?.concealedRoute) };
  const { route: startRoute, ...start } = startingValues(draftKey, recorded);
  const { register, control, handleSubmit, formState, setValue, getValues, reset } = useForm<PointValues>({ resolver: zodResolver(pointSchema), defaultValues: start });
  const v = useWatch({ control }) as PointValues;
  const [route, setRoute] = useState<ConcealedRoute | null>(() => readRoute(startRoute));
  const [error, setError] = useState<string | null>(null);
  const [figuresWrong, setFiguresWrong] = useState(false);
  // The drawing keeps its typed figures; a route put back from a draft or discarded is a drawing afresh.
  const [drawing, setDrawing] = useState(0);
  const draft = useFormDraft(draftKey, { ...v, route }, recorded, ({ route: r, ...values }) => {
    reset(values);
    setRoute(r);
    setDrawing((n) => n + 1);
  });
  const errors = formState.errors as Record<string, { message?: string } | undefined>;
  const circuit = circuits.find((c) => c.id === v.circuitId);
  const baseline = v.circuitId ? ringBaselines.get(v.circuitId) : undefined;

  // Choosing the circuit fills in what the phone already knows about it, without overwriting what was typed.
  useEffect(() => {
    if (!circuit) return;
    const fill = (field: keyof PointValues, value: number | null | undefined) => {
      if (value != null && getValues(field) === '') setValue(field, String(value));
    };
    fill('liveCsaMm2', circuit.liveCsaMm2);
    fill('cpcCsaMm2', circuit.cpcCsaMm2);
    if (baseline) {
      fill('beforeR1Ohm', baseline.r1);
      fill('beforeRnOhm', baseline.rn);
      fill('beforeR2Ohm', baseline.r2);
    }
  }, [circuit, baseline, getValues, setValue]);

  // The accessory says what the point supplies until the technician says otherwise.
  useEffect(() => {
    const guess = suppliesOf(v.accessoryKind ?? '');
    if (guess && getValues('supplies') === '' && !formState.dirtyFields.supplies) setValue('supplies', guess);
  }, [v.accessoryKind, getValues, setValue, formState.dirtyFields.supplies]);

  const extension = v.connection === 'ring-extension' ? predictExtension(v) : null;
  const fused = needsFuse(v.connection, v.accessoryKind);
  const load = usableReading(v.loadW);
  const fuse = useMemo(() => (fused && load !== null && load > 0 ? fuseForLoad({ watts: load }) : null), [fused, load]);
  // Worked out by core's rule as the form is filled in, the same as the office is shown from the saved row.
  const checks = useMemo(
    () => (v.connection || v.supplies ? checksBeforeWork({ point: { id: point?.id ?? 'new', ...pointFields(v, route, fuse) }, circuit: circuit ?? null, site }) : null),
    [v, route, fuse, circuit, site, point?.id],
  );
  const joined = v.connection === 'unfused-spur' || v.connection === 'fused-spur' || v.connection === 'radial';

  async function save(values: PointValues) {
    setError(null);
    if (route && figuresWrong) {
      setError('A figure in the wall drawing cannot stand: put right the one marked, or switch the route check off.');
      return;
    }
    const fields = pointFields(values, route, fuse);
    try {
      if (point) {
        await saveRecord('pointChange', point.id, fields);
        draft.settle();
        onSaved(point.id);
      } else {
        const created = Object.fromEntries(Object.entries({ visitId, siteId, ...fields }).filter(([, x]) => x !== null)) as Fields;
        const id = await createRecord('pointChange', created);
        draft.settle();
        onSaved(id);
      }
    } catch (err) {
      setError((err as Error).message);
    }
  }

  const numberInput = { htmlInput: { inputMode: 'decimal' as const } };
  // Filled in from the circuit when it is picked: the label must already sit above the value.
  const filledIn = { ...numberInput, inputLabel: { shrink: true } };
  const place = (side: 'from' | 'to', title: string) => (
    <Paper variant="outlined" sx={{ p: 1.5 }} component="fieldset" aria-label={title}>
      <Stack spacing={1.5}>
        <Typography variant="h3" component="legend">
          {title}
        </Typography>
        <NativeChoice label={`${title}: area`} {...register(`${side}AreaId`)} emptyLabel="Not given" options={areas.map((a) => ({ value: a.id, label: a.name }))} />
        <TextField
          label={`${title}: where on the wall`}
          placeholder={side === 'to' ? 'Left of the chimney breast' : 'Behind the sofa'}
          {...register(`${side}Description`)}
          error={!!errors[`${side}Description`]}
          helperText={errors[`${side}Description`]?.message}
        />
        <TextField
          label={`${title}: height to centre (mm)`}
          {...register(`${side}HeightMm`)}
          error={!!errors[`${side}HeightMm`]}
          helperText={errors[`${side}HeightMm`]?.message ?? ' '}
          slotProps={numberInput}
        />
      </Stack>
    </Paper>
  );

  return (
    <Box component="form" aria-label={point ? 'Point change' : 'Record a point change'} noValidate onSubmit={handleSubmit(save)}>
      <Box component="fieldset" disabled={locked} sx={{ border: 0, p: 0, m: 0, minWidth: 0 }}>
        <Stack spacing={2}>
          <DraftNotice draft={draft} />
          <Controller
            control={control}
            name="action"
            render={({ field }) => (
              <ToggleButtonGroup exclusive fullWidth value={field.value} onChange={(_, a) => a && field.onChange(a)} aria-label="What was done">
                {POINT_ACTIONS.map((a) => (
                  <ToggleButton key={a} value={a} sx={{ px: 0.5 }}>
                    {ACTION_WORDS[a]}
                  </ToggleButton>
                ))}
              </ToggleButtonGroup>
            )}
          />
          <TextField label="Accessory" {...register('accessoryKind')} error={!!errors.accessoryKind} helperText={errors.accessoryKind?.message ?? ' '} slotProps={{ htmlInput: { list: 'accessories' } }} />
          <datalist id="accessories">
            {ACCESSORIES.map((a) => (
              <option key={a} value={a} />
            ))}
          </datalist>
          {hasFrom(v.action) && place('from', 'Where it was')}
          {hasTo(v.action) && place('to', v.action === 'add' ? 'Where it is' : 'Where it is now')}
          <NativeChoice
            label="Circuit"
            {...register('circuitId')}
            error={!!errors.circuitId}
            helperText={errors.circuitId?.message ?? ' '}
            emptyLabel="Not given"
            options={circuits.map((c) => ({ value: c.id, label: `${c.number} · ${c.description || 'No description'}` }))}
          />
          <NativeChoice label="How it joins the circuit" {...register('connection')} emptyLabel="Not given" options={choicesOf(POINT_CONNECTIONS, CONNECTION_WORDS)} />
          <Stack direction="row" spacing={1.5}>
            <TextField label="Live size (mm²)" {...register('liveCsaMm2')} error={!!errors.liveCsaMm2} helperText={errors.liveCsaMm2?.message ?? ' '} slotProps={filledIn} />
            <TextField label="Cpc size (mm²)" {...register('cpcCsaMm2')} error={!!errors.cpcCsaMm2} helperText={errors.cpcCsaMm2?.message ?? ' '} slotProps={filledIn} />
          </Stack>
          {v.connection === 'ring-extension' && (
            <Paper variant="outlined" sx={{ p: 1.5 }} component="section" aria-label="Ring extension">
              <Stack spacing={1.5}>
                <Typography variant="h3">Ring extension</Typography>
                <TextField
                  label="Cable added to the ring (m)"
                  {...register('addedRouteM')}
                  error={!!errors.addedRouteM}
                  helperText={errors.addedRouteM?.message ?? 'Out to the new point and back.'}
                  slotProps={numberInput}
                />
                <Typography variant="body2" color="text.secondary">
                  End-to-end readings before the ring was broken{baseline ? ' (filled from the last ones recorded)' : ''}:
                </Typography>
                <Stack direction="row" spacing={1}>
                  {(['beforeR1Ohm', 'beforeRnOhm', 'beforeR2Ohm'] as const).map((f, i) => (
                    <TextField key={f} label={`${['r1', 'rn', 'r2'][i]} before (Ω)`} {...register(f)} error={!!errors[f]} helperText={errors[f]?.message ?? ' '} slotProps={filledIn} />
                  ))}
                </Stack>
                {extension?.prediction ? (
                  <Box role="status" aria-label="Predicted after the extension">
                    <Typography sx={{ fontWeight: 500 }}>Expect after the extension</Typography>
                    <Typography>
                      End to end: r1 {ohms(extension.prediction.r1)}, rn {ohms(extension.prediction.rn)}, r2 {ohms(extension.prediction.r2)}
                    </Typography>
                    <Typography sx={{ fontWeight: 500 }}>Predicted R1+R2 {ohms(extension.prediction.expectedR1R2)}</Typography>
                    <Typography variant="body2" color="text.secondary">
                      (r1 + r2) / 4, the highest reading on the ring once cross-connected. Each conductor gains the added length at its 20 °C resistance
                      (IEC 60228:2004), as the test is done cold.
                    </Typography>
                    <AidLine />
                  </Box>
                ) : (
                  extension && <Typography variant="body2" color="text.secondary">{extension.waiting}</Typography>
                )}
              </Stack>
            </Paper>
          )}
          {fused && (
            <Paper variant="outlined" sx={{ p: 1.5 }} component="section" aria-label="Fuse for the appliance">
              <Stack spacing={1.5}>
                <Typography variant="h3">Fuse for the appliance</Typography>
                <TextField label="Appliance load (W)" {...register('loadW')} error={!!errors.loadW} helperText={errors.loadW?.message ?? 'From its rating plate.'} slotProps={numberInput} />
                {fuse ? (
                  <Stack spacing={0.75} role="status" aria-label="Fuse to fit">
                    <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
                      <Typography sx={{ fontWeight: 500 }}>{fuse.fuseRatingA ? `Fit a ${fuse.fuseRatingA} A fuse` : 'No plug-top fuse will do'}</Typography>
                      <VerdictChip what="Fuse" result={fuse} against="none" />
                    </Stack>
                    <Typography variant="body2" color="text.secondary">
                      {fuse.note}
                    </Typography>
                    <AidLine />
                  </Stack>
                ) : (
                  <Typography variant="body2" color="text.secondary">
                    Enter the load to choose the fuse.
                  </Typography>
                )}
              </Stack>
            </Paper>
          )}
          {joined && (
            <Paper variant="outlined" sx={{ p: 1.5 }} component="section" aria-label="New cable">
              <Stack spacing={1.5}>
                <Typography variant="h3">New cable</Typography>
                <TextField label="Length of the new cable (m)" {...register('addedRouteM')} error={!!errors.addedRouteM} helperText={errors.addedRouteM?.message ?? 'From where it joins to the point.'} slotProps={numberInput} />
                <TextField
                  label="R1+R2 where it joins (Ω)"
                  {...register('joinR1R2Ohm')}
                  error={!!errors.joinR1R2Ohm}
                  helperText={errors.joinR1R2Ohm?.message ?? 'Measured at the socket or junction it is taken from; 0 for a new circuit from the board.'}
                  slotProps={numberInput}
                />
              </Stack>
            </Paper>
          )}
          {v.connection === 'unfused-spur' && (
            <Paper variant="outlined" sx={{ p: 1.5 }} component="section" aria-label="The ring's spurs">
              <Stack spacing={1.5}>
                <Typography variant="h3">The ring’s spurs</Typography>
                <Stack direction="row" spacing={1}>
                  <TextField label="Points on the ring" {...register('ringPoints')} error={!!errors.ringPoints} helperText={errors.ringPoints?.message ?? 'Sockets and fused connection units.'} slotProps={numberInput} />
                  <TextField label="Unfused spurs" {...register('ringUnfusedSpurs')} error={!!errors.ringUnfusedSpurs} helperText={errors.ringUnfusedSpurs?.message ?? 'This one included.'} slotProps={numberInput} />
                </Stack>
                <TextField label="Accessories this spur feeds" {...register('spurFeeds')} error={!!errors.spurFeeds} helperText={errors.spurFeeds?.message ?? 'A twin socket-outlet counts as one.'} slotProps={numberInput} />
                <Controller
                  control={control}
                  name="spurFromSpur"
                  render={({ field }) => <FormControlLabel control={<Switch checked={field.value} onChange={(e) => field.onChange(e.target.checked)} />} label="Taken from another spur" />}
                />
              </Stack>
            </Paper>
          )}
          <Paper variant="outlined" sx={{ p: 1.5 }} component="section" aria-label="Where the point is">
            <Stack spacing={1.5}>
              <Typography variant="h3">Where the point is</Typography>
              <NativeChoice label="What the point supplies" {...register('supplies')} emptyLabel="Not given" options={choicesOf(RCD_CIRCUIT_KINDS, SUPPLIES_WORDS)} />
              <NativeChoice label="Location" {...register('location')} options={choicesOf(POINT_LOCATIONS, LOCATION_WORDS)} />
              <Controller
                control={control}
                name="dwelling"
                render={({ field }) => <FormControlLabel control={<Switch checked={field.value} onChange={(e) => field.onChange(e.target.checked)} />} label="In a home" />}
              />
            </Stack>
          </Paper>
          <Paper variant="outlined" sx={{ p: 1.5 }} component="section" aria-label="Sizing a new cable">
            <Stack spacing={1.5}>
              <Typography variant="h3">Sizing a new cable</Typography>
              <Typography variant="body2" color="text.secondary">
                Pick how it runs to check its size and its cpc. Leave it unpicked where no new cable is run.
              </Typography>
              <Controller control={control} name="installationMethod" render={({ field }) => <InstallationMethodPicker value={field.value} onChange={field.onChange} disabled={locked} />} />
              {v.installationMethod && (
                <>
                  <TextField
                    label="Design current (A)"
                    {...register('designCurrentA')}
                    error={!!errors.designCurrentA}
                    helperText={errors.designCurrentA?.message ?? 'Blank: the load above, or 20 A on a ring.'}
                    slotProps={numberInput}
                  />
                  <Stack direction="row" spacing={1}>
                    <TextField label="Ca" {...register('ambientFactor')} error={!!errors.ambientFactor} helperText={errors.ambientFactor?.message ?? 'Ambient'} slotProps={numberInput} />
                    <TextField label="Cg" {...register('groupingFactor')} error={!!errors.groupingFactor} helperText={errors.groupingFactor?.message ?? 'Grouping'} slotProps={numberInput} />
                    <TextField label="Ci" {...register('insulationFactor')} error={!!errors.insulationFactor} helperText={errors.insulationFactor?.message ?? 'Insulation'} slotProps={numberInput} />
                  </Stack>
                  <Typography variant="caption" color="text.secondary">
                    Rating factors from BS 7671 Appendix 4 Tables 4B1, 4C1 and 52.2; blank counts as 1.
                  </Typography>
                </>
              )}
            </Stack>
          </Paper>
          {checks && (
            <Paper variant="outlined" sx={{ p: 1.5 }} role="status" aria-label="Checks before the work">
              <BeforeWorkChecks checks={checks} />
            </Paper>
          )}
          <Divider />
          <FormControlLabel
            control={<Switch checked={route !== null} onChange={(e) => setRoute(e.target.checked ? (route ?? newRoute((circuit?.rcdRatingMa ?? 999) <= 30, circuit?.rcdRatingMa ?? 30)) : null)} />}
            label="Check a new concealed cable route"
          />
          {route && <WallDiagram key={drawing} value={route} onChange={setRoute} disabled={locked} onFiguresWrong={setFiguresWrong} />}
          <SaveBar error={error} locked={locked} label={point ? 'Save point change' : 'Save new point change'} />
        </Stack>
      </Box>
    </Box>
  );
}
