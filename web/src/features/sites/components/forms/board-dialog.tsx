import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { FormSelectInput, FormTextInput } from '@/components/forms/form-inputs';
import { RecordDialog } from '@/components/forms/record-dialog';
import { asText, fieldsToSend, optionalId, optionalText, requiredText } from '@/lib/record-schema';
import type { Area } from '../../api/get-areas';
import type { Board } from '../../api/get-circuits';
import { useSaveBoard } from '../../api/save-record';

export const boardSchema = z.object({
  name: requiredText('board', 'name', 'Board name'),
  areaId: optionalId(),
  description: optionalText('board', 'description', 'Description'),
});

/** Adds a distribution board to the site, or changes one. */
export function BoardDialog({ siteId, board, areas, onClose }: { siteId: string; board?: Board; areas: Area[]; onClose: () => void }) {
  const save = useSaveBoard();
  const form = useForm<z.input<typeof boardSchema>, unknown, z.output<typeof boardSchema>>({
    resolver: zodResolver(boardSchema),
    defaultValues: { name: asText(board?.name), areaId: asText(board?.areaId), description: asText(board?.description) },
  });
  // Read while rendering, so that react-hook-form keeps track of which fields were touched.
  const { dirtyFields } = form.formState;
  const submit = form.handleSubmit((values) => {
    const changes = fieldsToSend(values, dirtyFields, !board);
    if (board && Object.keys(changes).length === 0) return onClose();
    save.mutate({ id: board?.id, values: board ? changes : { siteId, ...changes } }, { onSuccess: onClose });
  });
  return (
    <RecordDialog open title={board ? `Change ${board.name}` : 'Add a board'} submitLabel={board ? 'Save changes' : 'Add board'} onSubmit={submit} onClose={onClose} pending={save.isPending} error={save.error}>
      <FormTextInput form={form} name="name" label="Board name" hint="As marked, such as “Consumer unit” or “DB1”." autoFocus />
      <FormSelectInput form={form} name="areaId" label="Where it is" options={areas.map((a) => ({ value: a.id, label: a.level ? `${a.name} (${a.level})` : a.name }))} emptyLabel="Not recorded" />
      <FormTextInput form={form} name="description" label="Description" hint="Such as “10-way dual RCD board”." />
    </RecordDialog>
  );
}
