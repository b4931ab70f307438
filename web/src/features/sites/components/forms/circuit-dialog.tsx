import Stack from '@mui/material/Stack';
import { CIRCUIT_KIND_WORDS, CIRCUIT_KINDS, CONDUCTOR_SIZES_MM2, circuitDetailProblems, PROTECTIVE_DEVICE_WORDS, PROTECTIVE_DEVICES, RCD_TYPE_CHOICES, standardRatings } from '@wiretrail/core';
import { z } from 'zod';
import { FormOfferedInput, FormSelectInput, FormTextInput } from '@/components/forms/form-inputs';
import { RecordDialog } from '@/components/forms/record-dialog';
import { useRecordForm } from '@/components/forms/use-record-form';
import { optionalChoice, optionalNumber, optionalText, requiredId, requiredText, startingTexts } from '@/lib/record-schema';
import type { Board, Circuit } from '../../api/get-circuits';
import { useSaveCircuit } from '../../api/save-record';

export const circuitSchema = z.object({
  boardId: requiredId('the board'),
  number: requiredText('circuit', 'number', 'Circuit number'),
  description: optionalText('circuit', 'description', 'Description'),
  kind: optionalChoice('circuit', 'kind', 'Kind of circuit'),
  deviceType: optionalChoice('circuit', 'deviceType', 'Protective device'),
  deviceRatingA: optionalNumber('circuit', 'deviceRatingA', 'Rating', { unit: 'A', example: 32 }),
  rcdRatingMa: optionalNumber('circuit', 'rcdRatingMa', 'RCD rating', { unit: 'mA', example: 30 }),
  rcdType: optionalText('circuit', 'rcdType', 'RCD type'),
  liveCsaMm2: optionalNumber('circuit', 'liveCsaMm2', 'Live conductor size', { unit: 'mm²', example: 2.5 }),
  cpcCsaMm2: optionalNumber('circuit', 'cpcCsaMm2', 'cpc size', { unit: 'mm²', example: 1.5 }),
  lengthM: optionalNumber('circuit', 'lengthM', 'Cable length', { unit: 'm', example: 20 }),
})
  // What cannot be so (a 17 A type B breaker, an RCD of type Q, a cpc larger than its live conductors), beside its field.
  .superRefine((v, ctx) => {
    for (const [field, message] of Object.entries(circuitDetailProblems(v))) ctx.addIssue({ code: 'custom', path: [field], message });
  });

const KINDS = CIRCUIT_KINDS.map((k) => ({ value: k, label: CIRCUIT_KIND_WORDS[k] }));
const DEVICES = PROTECTIVE_DEVICES.map((d) => ({ value: d, label: PROTECTIVE_DEVICE_WORDS[d] }));
const SIZES = CONDUCTOR_SIZES_MM2.map(String);

/** Adds a circuit to one of the site's boards, or changes one; the checks judge test results against what is recorded here. */
export function CircuitDialog({ siteId, circuit, boards, onClose }: { siteId: string; circuit?: Circuit; boards: Board[]; onClose: () => void }) {
  const save = useSaveCircuit();
  const { form, submit } = useRecordForm(circuitSchema, { ...startingTexts(circuitSchema, circuit), boardId: circuit?.boardId ?? (boards.length === 1 ? boards[0]!.id : '') }, {
    isNew: !circuit,
    onUnchanged: onClose,
    onChanges: (changes) => save.mutate({ id: circuit?.id, values: circuit ? changes : { siteId, ...changes } }, { onSuccess: onClose }),
  });
  const deviceType = form.watch('deviceType');
  const ratings = deviceType ? (standardRatings(deviceType) ?? []).map(String) : [];
  return (
    <RecordDialog open title={circuit ? `Change circuit ${circuit.number}` : 'Add a circuit'} submitLabel={circuit ? 'Save changes' : 'Add circuit'} onSubmit={submit} onClose={onClose} pending={save.isPending} error={save.error}>
      <Stack direction="row" spacing={2}>
        <FormSelectInput form={form} name="boardId" label="Board" options={boards.map((b) => ({ value: b.id, label: b.name }))} />
        <FormTextInput form={form} name="number" label="Circuit number" hint="The way as marked, such as 4 or L1-3." sx={{ maxWidth: 220 }} />
      </Stack>
      <FormTextInput form={form} name="description" label="Description" hint="What it feeds, such as “Sockets, ground floor”." />
      <FormSelectInput form={form} name="kind" label="Kind of circuit" options={KINDS} emptyLabel="Not recorded" />
      <Stack direction="row" spacing={2}>
        <FormSelectInput form={form} name="deviceType" label="Protective device" options={DEVICES} emptyLabel="Not recorded" />
        <FormOfferedInput form={form} name="deviceRatingA" label="Rating" hint={deviceType ? 'A; the ratings it is made in, or type one' : 'A'} options={ratings} inputMode="decimal" sx={{ minWidth: 160, maxWidth: 220 }} />
      </Stack>
      <Stack direction="row" spacing={2}>
        <FormTextInput form={form} name="rcdRatingMa" label="RCD rating" hint="mA; empty if no RCD" inputMode="decimal" />
        <FormOfferedInput form={form} name="rcdType" label="RCD type" hint="As marked: A, AC, F, B; S if time-delayed" options={RCD_TYPE_CHOICES} sx={{ flex: 1 }} />
      </Stack>
      <Stack direction="row" spacing={2}>
        <FormOfferedInput form={form} name="liveCsaMm2" label="Live conductor size" hint="mm²" options={SIZES} inputMode="decimal" sx={{ flex: 1 }} />
        <FormOfferedInput form={form} name="cpcCsaMm2" label="cpc size" hint="mm²" options={SIZES} inputMode="decimal" sx={{ flex: 1 }} />
      </Stack>
      <FormTextInput form={form} name="lengthM" label="Cable length" hint="m to the furthest point; a radial's R1+R2 is checked against it" inputMode="decimal" />
    </RecordDialog>
  );
}
