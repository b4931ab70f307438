import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { CIRCUIT_KIND_WORDS, CIRCUIT_KINDS, FAULT_PROTECTION_METHODS, type FieldValue, PROTECTIVE_DEVICE_WORDS, PROTECTIVE_DEVICES } from '@wiretrail/core';
import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import { z } from 'zod';
import type { CircuitRow } from '@/lib/db';
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
});
export type CircuitDetails = z.infer<typeof circuitDetailsSchema>;

/**
 * What the form starts from: the circuit as recorded, or blanks for a new one (a guess would be recorded as fact).
 * "New" is said of the visit the form is open on: a circuit installed new on an earlier job is existing now.
 */
export function circuitDetailsOf(c: CircuitRow | null, visitId?: string): CircuitDetails {
  return {
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
  };
}

/** Kind, protective device, RCD and cable sizes, for the add and edit forms alike. */
export function CircuitDetailFields({ register, errors }: { register: UseFormRegister<CircuitDetails>; errors: FieldErrors<CircuitDetails> }) {
  const num = { htmlInput: { inputMode: 'decimal' as const } };
  return (
    <>
      <NativeChoice label="Kind" {...register('kind')} options={choicesOf(CIRCUIT_KINDS, CIRCUIT_KIND_WORDS)} />
      <Stack direction="row" spacing={1.5}>
        <NativeChoice label="Protective device" {...register('deviceType')} emptyLabel="Not known" options={choicesOf(PROTECTIVE_DEVICES, PROTECTIVE_DEVICE_WORDS)} />
        <TextField label="Rating (A)" {...register('deviceRatingA')} error={!!errors.deviceRatingA} helperText={errors.deviceRatingA?.message ?? ' '} slotProps={num} sx={{ maxWidth: 130 }} />
      </Stack>
      <Stack direction="row" spacing={1.5}>
        <TextField label="RCD (mA)" {...register('rcdRatingMa')} error={!!errors.rcdRatingMa} helperText={errors.rcdRatingMa?.message ?? 'Blank if none.'} slotProps={num} />
        <TextField label="RCD type" placeholder="A" {...register('rcdType')} error={!!errors.rcdType} helperText={errors.rcdType?.message ?? 'A, AC, F, B; S if delayed.'} />
      </Stack>
      <Stack direction="row" spacing={1.5}>
        <TextField label="Live size (mm²)" {...register('liveCsaMm2')} error={!!errors.liveCsaMm2} helperText={errors.liveCsaMm2?.message ?? ' '} slotProps={num} />
        <TextField label="Cpc size (mm²)" {...register('cpcCsaMm2')} error={!!errors.cpcCsaMm2} helperText={errors.cpcCsaMm2?.message ?? ' '} slotProps={num} />
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
