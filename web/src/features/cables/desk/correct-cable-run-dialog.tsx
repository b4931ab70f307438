import Stack from '@mui/material/Stack';
import { z } from 'zod';
import { FormTextInput } from '@/components/forms/form-inputs';
import { RecordDialog } from '@/components/forms/record-dialog';
import { useRecordForm } from '@/components/forms/use-record-form';
import { optionalText, requiredText, startingTexts } from '@/lib/record-schema';
import type { CableRun } from '../api/get-cable-runs';
import { useCorrectCableRun } from '../api/update-cable-run';

export const cableCorrectionSchema = z.object({
  label: requiredText('cableRun', 'label', 'Label'),
  endADescription: optionalText('cableRun', 'endADescription', 'From position'),
  endATermination: optionalText('cableRun', 'endATermination', 'From termination'),
  endBDescription: optionalText('cableRun', 'endBDescription', 'To position'),
  endBTermination: optionalText('cableRun', 'endBTermination', 'To termination'),
});

/** Corrects the words of a cable run: its label and where each end is. Measurements stay as they were taken on site. */
export function CorrectCableRunDialog({ run, onClose }: { run: CableRun; onClose: () => void }) {
  const save = useCorrectCableRun();
  const { form, submit } = useRecordForm(cableCorrectionSchema, startingTexts(cableCorrectionSchema, run), {
    isNew: false,
    onUnchanged: onClose,
    onChanges: (changes) => save.mutate({ id: run.id, changes: changes as Record<string, string | null> }, { onSuccess: onClose }),
  });
  return (
    <RecordDialog open title={`Correct cable ${run.label}`} submitLabel="Save correction" onSubmit={submit} onClose={onClose} pending={save.isPending} error={save.error}>
      <FormTextInput form={form} name="label" label="Label" hint="As written on both ends of the cable." autoFocus sx={{ maxWidth: 240 }} />
      <Stack direction="row" spacing={2}>
        <FormTextInput form={form} name="endADescription" label="From position" hint={run.endAAreaName ? `In ${run.endAAreaName}` : undefined} />
        <FormTextInput form={form} name="endATermination" label="From termination" />
      </Stack>
      <Stack direction="row" spacing={2}>
        <FormTextInput form={form} name="endBDescription" label="To position" hint={run.endBAreaName ? `In ${run.endBAreaName}` : undefined} />
        <FormTextInput form={form} name="endBTermination" label="To termination" />
      </Stack>
    </RecordDialog>
  );
}
