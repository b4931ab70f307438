import { z } from 'zod';
import { FormTextInput } from '@/components/forms/form-inputs';
import { RecordDialog } from '@/components/forms/record-dialog';
import { useRecordForm } from '@/components/forms/use-record-form';
import { optionalText, requiredText, startingTexts } from '@/lib/record-schema';
import type { Area } from '../../api/get-areas';
import { useSaveArea } from '../../api/save-record';

export const areaSchema = z.object({
  name: requiredText('area', 'name', 'Area name'),
  level: optionalText('area', 'level', 'Floor or level'),
});

/** Adds a room or place on the site, or renames one. */
export function AreaDialog({ siteId, area, onClose }: { siteId: string; area?: Area; onClose: () => void }) {
  const save = useSaveArea();
  const { form, submit } = useRecordForm(areaSchema, startingTexts(areaSchema, area), {
    isNew: !area,
    onUnchanged: onClose,
    onChanges: (changes) => save.mutate({ id: area?.id, values: area ? changes : { siteId, ...changes } }, { onSuccess: onClose }),
  });
  return (
    <RecordDialog open maxWidth="xs" title={area ? `Change ${area.name}` : 'Add an area'} submitLabel={area ? 'Save changes' : 'Add area'} onSubmit={submit} onClose={onClose} pending={save.isPending} error={save.error}>
      <FormTextInput form={form} name="name" label="Area name" hint="A room or place, such as “Cupboard under stairs”." autoFocus />
      <FormTextInput form={form} name="level" label="Floor or level" hint="Optional, such as “Ground” or “First”." />
    </RecordDialog>
  );
}
