import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import {
  AFDD_STANDARD,
  CIRCUIT_KIND_WORDS,
  CONDUCTOR_SIZES_MM2,
  CIRCUIT_KINDS,
  DEVICE_STANDARD_CHOICES,
  deviceStandardFor,
  FAULT_PROTECTION_METHODS,
  type FieldValue,
  PROTECTIVE_DEVICE_WORDS,
  PROTECTIVE_DEVICES,
  RCBO_STANDARD,
  RCD_STANDARD_CHOICES,
  RCD_TYPE_CHOICES,
  rcdStandardFor,
  standardDisconnectionTime,
  standardRatings,
} from '@wiretrail/core';
import { type Control, Controller, type FieldErrors, type UseFormRegister, useWatch } from 'react-hook-form';
import { z } from 'zod';
import type { CircuitRow } from '@/lib/db';
import { circuitDetailProblems } from '@wiretrail/core';
import { OfferedValuesInput } from '@/components/forms/offered-values-input';
import { choicesOf, NativeChoice } from '@/components/forms/phone-inputs';
import { readingField, readingText, usableReading } from '@/lib/readings';

export const FAULT_PROTECTION_WORDS: Record<string, string> = {
  'overcurrent-device': 'By the protective device (Tables 41.2 to 41.4)',
  rcd: 'By the RCD (Table 41.5)',
};
const INSTALLED = ['existing', 'new'] as const;
const INSTALLED_WORDS: Record<string, string> = { existing: 'An existing circuit, altered or added to', new: 'A new circuit, installed on this visit' };

/** The circuit's own details that its tests depend on. */
export const circuitDetailsSchema = z.object({
  kind: z.enum(CIRCUIT_KINDS),
  deviceType: z.enum(['', ...PROTECTIVE_DEVICES]),
  deviceRatingA: readingField('circuit', 'deviceRatingA', 'The device rating', 'A'),
  rcdRatingMa: readingField('circuit', 'rcdRatingMa', 'The RCD rating', 'mA'),
  rcdType: z.string().max(20, 'The RCD type must be at most 20 characters.'),
  liveCsaMm2: readingField('circuit', 'liveCsaMm2', 'The live conductor size', 'mm²'),
  cpcCsaMm2: readingField('circuit', 'cpcCsaMm2', 'The cpc size', 'mm²'),
  lengthM: readingField('circuit', 'lengthM', 'The cable length', 'm'),
  faultProtection: z.enum(['', ...FAULT_PROTECTION_METHODS]),
  installed: z.enum(INSTALLED),
  // What the certificate states beyond what the tests need.
  deviceStandard: z.string().max(40, 'The device standard must be at most 40 characters.'),
  rcdStandard: z.string().max(40, 'The RCD standard must be at most 40 characters.'),
  rcdRatedCurrentA: readingField('circuit', 'rcdRatedCurrentA', 'The RCD rated current', 'A'),
  afddStandard: z.string().max(40, 'The AFDD standard must be at most 40 characters.'),
  referenceMethod: z.string().max(20, 'The reference method must be at most 20 characters.'),
  pointsServed: readingField('circuit', 'pointsServed', 'The number of points served'),
  maxDisconnectionS: readingField('circuit', 'maxDisconnectionS', 'The maximum disconnection time', 's'),
  // An installation certificate's schedule also states these.
  wiringType: z.string().max(40, 'The type of wiring must be at most 40 characters.'),
  deviceBreakingKa: readingField('circuit', 'deviceBreakingKa', 'The breaking capacity', 'kA'),
});
export type CircuitDetails = z.infer<typeof circuitDetailsSchema>;

/**
 * What core says cannot be so in the details as typed (a 17 A type B breaker, an RCD of type Q, a cpc larger than
 * its live conductors), each beside its field. Added where the schema is used, so the schema itself can be extended.
 */
export function checkCircuitDetails(v: Pick<CircuitDetails, 'deviceType' | 'deviceRatingA' | 'rcdType' | 'liveCsaMm2' | 'cpcCsaMm2'>, ctx: z.RefinementCtx): void {
  const problems = circuitDetailProblems({
    deviceType: v.deviceType || null,
    deviceRatingA: usableReading(v.deviceRatingA),
    rcdType: v.rcdType.trim() || null,
    liveCsaMm2: usableReading(v.liveCsaMm2),
    cpcCsaMm2: usableReading(v.cpcCsaMm2),
  });
  for (const [field, message] of Object.entries(problems)) ctx.addIssue({ code: 'custom', path: [field], message });
}

/**
 * The standard values offered for what a certificate states of a circuit, where nothing is recorded yet: the
 * standard its kind of device is made to, the RCD's by its type (and an RCBO's rated current is its breaker's), and
 * the longest disconnection time the regulations allow on this earthing. Each shows as an offer until saved.
 */
export function certificateOffers(c: Pick<CircuitDetails, 'kind' | 'deviceType' | 'deviceRatingA' | 'rcdRatingMa' | 'rcdType' | 'rcdStandard'>, earthing: string | null | undefined) {
  const rating = usableReading(c.deviceRatingA);
  const hasRcd = usableReading(c.rcdRatingMa) !== null;
  const rcdStandard = hasRcd ? rcdStandardFor(c.rcdType) : '';
  return {
    deviceStandard: deviceStandardFor(c.deviceType) ?? '',
    rcdStandard,
    rcdRatedCurrentA: hasRcd && c.rcdStandard === RCBO_STANDARD && rating !== null ? String(rating) : '',
    maxDisconnectionS: readingText(standardDisconnectionTime({ kind: c.kind, deviceRatingA: rating }, earthing)?.seconds),
  };
}

/**
 * What the form starts from: the circuit as recorded, or blanks for a new one (a guess would be recorded as fact),
 * with the standard values offered where the certificate's details are not recorded yet. "New" is said of the visit
 * the form is open on: a circuit installed new on an earlier job is existing now.
 */
export function circuitDetailsOf(c: CircuitRow | null, visitId?: string, earthing?: string | null): CircuitDetails {
  const recorded: CircuitDetails = {
    kind: c?.kind ?? 'ring',
    deviceType: c?.deviceType ?? '',
    deviceRatingA: readingText(c?.deviceRatingA),
    rcdRatingMa: readingText(c?.rcdRatingMa),
    rcdType: c?.rcdType ?? '',
    liveCsaMm2: readingText(c?.liveCsaMm2),
    cpcCsaMm2: readingText(c?.cpcCsaMm2),
    lengthM: readingText(c?.lengthM),
    faultProtection: (c?.faultProtection as CircuitDetails['faultProtection']) ?? '',
    installed: visitId && c?.newOnVisitId === visitId ? 'new' : 'existing',
    deviceStandard: c?.deviceStandard ?? '',
    rcdStandard: c?.rcdStandard ?? '',
    rcdRatedCurrentA: readingText(c?.rcdRatedCurrentA),
    afddStandard: c?.afddStandard ?? '',
    referenceMethod: c?.referenceMethod ?? '',
    pointsServed: readingText(c?.pointsServed),
    maxDisconnectionS: readingText(c?.maxDisconnectionS),
    wiringType: c?.wiringType ?? '',
    deviceBreakingKa: readingText(c?.deviceBreakingKa),
  };
  if (!c) return recorded;
  const offers = certificateOffers(recorded, earthing);
  return {
    ...recorded,
    deviceStandard: recorded.deviceStandard || offers.deviceStandard,
    rcdStandard: recorded.rcdStandard || offers.rcdStandard,
    rcdRatedCurrentA: recorded.rcdRatedCurrentA || offers.rcdRatedCurrentA,
    maxDisconnectionS: recorded.maxDisconnectionS || offers.maxDisconnectionS,
  };
}

/** The fields to write; the mark of a circuit installed new on another visit is left as it is. */
export function circuitDetailFields(v: CircuitDetails, visitId?: string, current?: CircuitRow | null): Record<string, FieldValue> {
  const markedHere = !!visitId && current?.newOnVisitId === visitId;
  const newOnVisitId = v.installed === 'new' && visitId ? visitId : markedHere ? null : (current?.newOnVisitId ?? null);
  return {
    faultProtection: v.faultProtection || null,
    newOnVisitId,
    kind: v.kind,
    deviceType: v.deviceType || null,
    deviceRatingA: usableReading(v.deviceRatingA),
    rcdRatingMa: usableReading(v.rcdRatingMa),
    rcdType: v.rcdType.trim() || null,
    liveCsaMm2: usableReading(v.liveCsaMm2),
    cpcCsaMm2: usableReading(v.cpcCsaMm2),
    lengthM: usableReading(v.lengthM),
    deviceStandard: v.deviceStandard.trim() || null,
    rcdStandard: v.rcdStandard.trim() || null,
    rcdRatedCurrentA: usableReading(v.rcdRatedCurrentA),
    afddStandard: v.afddStandard.trim() || null,
    referenceMethod: v.referenceMethod.trim() || null,
    pointsServed: usableReading(v.pointsServed),
    maxDisconnectionS: usableReading(v.maxDisconnectionS),
    wiringType: v.wiringType.trim() || null,
    deviceBreakingKa: usableReading(v.deviceBreakingKa),
  };
}

const SIZES = CONDUCTOR_SIZES_MM2.map(String);
/** Types of wiring a schedule usually names (common trade practice): offered, never assumed. */
const WIRING_TYPES = ['Twin and earth', 'SWA', 'Singles in conduit', 'Singles in trunking', 'MICC', 'FP200'];
/** Breaking capacities printed on domestic circuit-breakers and RCBOs (kA; common trade practice). */
const BREAKING_CAPACITIES = ['6', '10', '16'];

/** The ratings a device is made in, to offer once the device is known. */
export const ratingsOffered = (deviceType: string): string[] => (deviceType ? (standardRatings(deviceType) ?? []).map(String) : []);

/** Kind, protective device, RCD and cable sizes, for the add and edit forms alike. */
export function CircuitDetailFields({ register, control, errors }: { register: UseFormRegister<CircuitDetails>; control: Control<CircuitDetails>; errors: FieldErrors<CircuitDetails> }) {
  const num = { htmlInput: { inputMode: 'decimal' as const } };
  const deviceType = useWatch({ control, name: 'deviceType' });
  return (
    <>
      {/* Controlled, so the recorded choice shows and the standard values offered follow it. */}
      <Controller control={control} name="kind" render={({ field }) => <NativeChoice label="Kind" {...field} options={choicesOf(CIRCUIT_KINDS, CIRCUIT_KIND_WORDS)} />} />
      {/* Stacked on a phone, so the device's name is not cut short. */}
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
        <Controller
          control={control}
          name="deviceType"
          render={({ field }) => <NativeChoice label="Protective device" {...field} emptyLabel="Not known" options={choicesOf(PROTECTIVE_DEVICES, PROTECTIVE_DEVICE_WORDS)} />}
        />
        <Controller
          control={control}
          name="deviceRatingA"
          render={({ field }) => (
            <OfferedValuesInput
              label="Rating (A)"
              {...field}
              options={ratingsOffered(deviceType)}
              error={!!errors.deviceRatingA}
              helperText={errors.deviceRatingA?.message ?? (deviceType ? 'The ratings it is made in, or type one.' : ' ')}
              inputMode="decimal"
              sx={{ minWidth: 150, maxWidth: { sm: 200 } }}
            />
          )}
        />
      </Stack>
      <Stack direction="row" spacing={1.5}>
        <TextField label="RCD (mA)" {...register('rcdRatingMa')} error={!!errors.rcdRatingMa} helperText={errors.rcdRatingMa?.message ?? 'Blank if none.'} slotProps={num} />
        <Controller
          control={control}
          name="rcdType"
          render={({ field }) => (
            <OfferedValuesInput label="RCD type" {...field} options={RCD_TYPE_CHOICES} error={!!errors.rcdType} helperText={errors.rcdType?.message ?? 'A, AC, F, B; S if delayed.'} sx={{ flex: 1 }} />
          )}
        />
      </Stack>
      <Stack direction="row" spacing={1.5}>
        {(['liveCsaMm2', 'cpcCsaMm2'] as const).map((name) => (
          <Controller
            key={name}
            control={control}
            name={name}
            render={({ field }) => (
              <OfferedValuesInput
                label={name === 'liveCsaMm2' ? 'Live size (mm²)' : 'Cpc size (mm²)'}
                {...field}
                options={SIZES}
                error={!!errors[name]}
                helperText={errors[name]?.message ?? ' '}
                inputMode="decimal"
                sx={{ flex: 1 }}
              />
            )}
          />
        ))}
      </Stack>
      <TextField
        label="Cable length to the furthest point (m)"
        {...register('lengthM')}
        error={!!errors.lengthM}
        helperText={errors.lengthM?.message ?? 'On a radial, R1+R2 is checked against the cable’s own resistance.'}
        slotProps={num}
      />
      <NativeChoice
        label="Fault protection"
        {...register('faultProtection')}
        emptyLabel="Not recorded"
        options={choicesOf(FAULT_PROTECTION_METHODS, FAULT_PROTECTION_WORDS)}
        helperText="How this circuit disconnects under an earth fault: it decides which table Zs is held to. On a TT supply it is usually the RCD."
      />
      <NativeChoice
        label="Existing or new"
        {...register('installed')}
        options={choicesOf(INSTALLED, INSTALLED_WORDS)}
        helperText="A new circuit is certified with an electrical installation certificate, not a minor works certificate."
      />
    </>
  );
}

/** Choices that keep a value already recorded even where it is not one of the usual ones. */
const standardChoices = (usual: readonly string[], current: string) => [...(current && !usual.includes(current) ? [current] : []), ...usual].map((v) => ({ value: v, label: v }));

/**
 * What a certificate states of the circuit beyond what its tests need: the devices' product standards, the RCD's
 * rated current, an AFDD, the reference method, the points served and the longest disconnection time allowed.
 * `offered` names the fields showing a standard value not yet saved, so the technician checks them against the device.
 */
export function CertificateDetailFields({
  register,
  control,
  errors,
  values,
  offered,
}: {
  register: UseFormRegister<CircuitDetails>;
  // The choices are controlled, so an offered value shows the moment it is offered.
  control: Control<CircuitDetails>;
  errors: FieldErrors<CircuitDetails>;
  values: Pick<CircuitDetails, 'deviceStandard' | 'rcdStandard' | 'rcdRatingMa'>;
  offered: ReadonlySet<keyof CircuitDetails>;
}) {
  const num = { htmlInput: { inputMode: 'decimal' as const } };
  const hint = (field: keyof CircuitDetails, usual: string, offeredWords = 'The standard value: check it against the device.') => errors[field]?.message ?? (offered.has(field) ? offeredWords : usual);
  const hasRcd = usableReading(values.rcdRatingMa) !== null;
  return (
    <>
      <Controller
        control={control}
        name="deviceStandard"
        render={({ field }) => (
          <NativeChoice label="Device standard, BS (EN)" {...field} emptyLabel="Not known" options={standardChoices(DEVICE_STANDARD_CHOICES, values.deviceStandard)} helperText={hint('deviceStandard', 'As printed on the device.')} />
        )}
      />
      {hasRcd && (
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
          <Controller
            control={control}
            name="rcdStandard"
            render={({ field }) => (
              <NativeChoice label="RCD standard, BS (EN)" {...field} emptyLabel="Not known" options={standardChoices(RCD_STANDARD_CHOICES, values.rcdStandard)} helperText={hint('rcdStandard', 'BS EN 61009-1 for an RCBO.')} />
            )}
          />
          <TextField label="RCD rated current (A)" {...register('rcdRatedCurrentA')} error={!!errors.rcdRatedCurrentA} helperText={hint('rcdRatedCurrentA', 'In, as printed on it.')} slotProps={num} sx={{ maxWidth: { sm: 170 } }} />
        </Stack>
      )}
      <Controller
        control={control}
        name="afddStandard"
        render={({ field }) => <NativeChoice label="AFDD" {...field} emptyLabel="None fitted" options={standardChoices([AFDD_STANDARD], field.value)} helperText=" " />}
      />
      <Stack direction="row" spacing={1.5}>
        <TextField label="Reference method" placeholder="C" {...register('referenceMethod')} error={!!errors.referenceMethod} helperText={errors.referenceMethod?.message ?? 'How the cable is installed, as in Appendix 4.'} />
        <TextField label="Points served" {...register('pointsServed')} error={!!errors.pointsServed} helperText={errors.pointsServed?.message ?? ' '} slotProps={{ htmlInput: { inputMode: 'numeric' } }} sx={{ maxWidth: 130 }} />
      </Stack>
      <Stack direction="row" spacing={1.5}>
        <Controller
          control={control}
          name="wiringType"
          render={({ field }) => (
            <OfferedValuesInput label="Type of wiring" {...field} options={WIRING_TYPES} error={!!errors.wiringType} helperText={errors.wiringType?.message ?? 'Twin and earth, SWA, singles in conduit…'} sx={{ flex: 1 }} />
          )}
        />
        <Controller
          control={control}
          name="deviceBreakingKa"
          render={({ field }) => (
            <OfferedValuesInput
              label="Breaking capacity (kA)"
              {...field}
              options={BREAKING_CAPACITIES}
              error={!!errors.deviceBreakingKa}
              helperText={errors.deviceBreakingKa?.message ?? 'As printed on the device.'}
              inputMode="decimal"
              sx={{ maxWidth: 170 }}
            />
          )}
        />
      </Stack>
      <TextField label="Maximum disconnection time (s)" {...register('maxDisconnectionS')} error={!!errors.maxDisconnectionS} helperText={hint('maxDisconnectionS', 'Allowed by the regulations for this circuit.', 'From Table 41.1 for this circuit and supply: check it applies.')} slotProps={num} />
    </>
  );
}
