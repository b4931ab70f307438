import { z } from 'zod';
import { FormSelectInput, FormTextInput } from '@/components/forms/form-inputs';
import { RecordDialog } from '@/components/forms/record-dialog';
import { useRecordForm } from '@/components/forms/use-record-form';
import { optionalId, optionalText, requiredText, startingTexts } from '@/lib/record-schema';
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
  const { form, submit } = useRecordForm(boardSchema, startingTexts(boardSchema, board), {
    isNew: !board,
    onUnchanged: onClose,
    onChanges: (changes) => save.mutate({ id: board?.id, values: board ? changes : { siteId, ...changes } }, { onSuccess: onClose }),
  });
  return (
    <RecordDialog open title={board ? `Change ${board.name}` : 'Add a board'} submitLabel={board ? 'Save changes' : 'Add board'} onSubmit={submit} onClose={onClose} pending={save.isPending} error={save.error}>
      <FormTextInput form={form} name="name" label="Board name" hint="As marked, such as “Consumer unit” or “DB1”." autoFocus />
      <FormSelectInput form={form} name="areaId" label="Where it is" options={areas.map((a) => ({ value: a.id, label: a.level ? `${a.name} (${a.level})` : a.name }))} emptyLabel="Not recorded" />
      <FormTextInput form={form} name="description" label="Description" hint="Such as “10-way dual RCD board”." />
    </RecordDialog>
  );
}
