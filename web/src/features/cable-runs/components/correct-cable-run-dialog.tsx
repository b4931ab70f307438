import { zodResolver } from '@hookform/resolvers/zod';
import Stack from '@mui/material/Stack';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { FormTextInput } from '@/components/forms/form-inputs';
import { RecordDialog } from '@/components/forms/record-dialog';
import { asText, fieldsToSend, optionalText, requiredText } from '@/lib/record-schema';
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
  const form = useForm<z.input<typeof cableCorrectionSchema>, unknown, z.output<typeof cableCorrectionSchema>>({
    resolver: zodResolver(cableCorrectionSchema),
    defaultValues: {
      label: run.label,
      endADescription: asText(run.endADescription),
      endATermination: asText(run.endATermination),
      endBDescription: asText(run.endBDescription),
      endBTermination: asText(run.endBTermination),
    },
  });
  // Read while rendering, so that react-hook-form keeps track of which fields were touched.
  const { dirtyFields } = form.formState;
  const submit = form.handleSubmit((values) => {
    const changes = fieldsToSend(values, dirtyFields, false);
    if (Object.keys(changes).length === 0) return onClose();
    save.mutate({ id: run.id, changes: changes as Record<string, string | null> }, { onSuccess: onClose });
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
