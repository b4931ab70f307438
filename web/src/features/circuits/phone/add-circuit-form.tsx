import { zodResolver } from '@hookform/resolvers/zod';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { type Control, type FieldErrors, useForm, type UseFormRegister, useWatch } from 'react-hook-form';
import { v7 as uuidv7 } from 'uuid';
import { z } from 'zod';
import { DraftNotice } from '@/components/forms/draft-notice';
import { startingValues, useFormDraft } from '@/components/forms/form-draft';
import type { BoardRow } from '@/lib/db';
import { createRecords, type Fields } from '@/lib/sync/local-write';
import { type CircuitDetails, CircuitDetailFields, checkCircuitDetails, circuitDetailFields, circuitDetailsOf, circuitDetailsSchema } from './circuit-fields';

const NEW_BOARD = 'new';

export const addCircuitSchema = circuitDetailsSchema
  .extend({
    boardId: z.string(),
    boardName: z.string().max(200, 'The board name must be at most 200 characters.'),
    number: z.string().trim().min(1, 'Give the circuit number or way.').max(20, 'The circuit number must be at most 20 characters.'),
    description: z.string().max(500, 'The description must be at most 500 characters.'),
  })
  .superRefine((v, ctx) => {
    checkCircuitDetails(v, ctx);
    if (v.boardId === NEW_BOARD && !v.boardName.trim()) ctx.addIssue({ code: 'custom', path: ['boardName'], message: 'Name the board, for example "Consumer unit, hall".' });
  });
type AddCircuitValues = z.infer<typeof addCircuitSchema>;

/** A circuit found on site, with what its tests need; with no board on the phone yet, the board is named here too. */
export function AddCircuitForm({ siteId, visitId, boards, onAdded }: { siteId: string; visitId: string; boards: BoardRow[]; onAdded?: (circuitId: string) => void }) {
  const draftKey = `new-circuit.${visitId}`;
  const recorded: AddCircuitValues = { boardId: boards[0]?.id ?? NEW_BOARD, boardName: '', number: '', description: '', ...circuitDetailsOf(null) };
  const { register, handleSubmit, formState, reset, control, setValue, getValues } = useForm<AddCircuitValues>({
    resolver: zodResolver(addCircuitSchema),
    defaultValues: startingValues(draftKey, recorded),
  });
  const draft = useFormDraft(draftKey, useWatch({ control }) as AddCircuitValues, recorded, reset);
  const [saved, setSaved] = useState('');
  const [error, setError] = useState<string | null>(null);
  const boardId = useWatch({ control, name: 'boardId' });
  const errors = formState.errors;

  async function add(v: AddCircuitValues) {
    setError(null);
    const items: { entity: 'board' | 'circuit'; id?: string; fields: Fields }[] = [];
    let targetBoard = v.boardId;
    if (v.boardId === NEW_BOARD) {
      targetBoard = uuidv7();
      items.push({ entity: 'board', id: targetBoard, fields: { siteId, name: v.boardName.trim() } });
    }
    const details = Object.fromEntries(Object.entries(circuitDetailFields(v, visitId)).filter(([, x]) => x !== null)) as Fields;
    const circuitId = uuidv7();
    items.push({ entity: 'circuit', id: circuitId, fields: { siteId, boardId: targetBoard, number: v.number.trim(), ...(v.description.trim() ? { description: v.description.trim() } : {}), ...details } });
    try {
      await createRecords(items);
      reset({ ...v, boardId: targetBoard, boardName: '', number: '', description: '' });
      setValue('boardId', targetBoard);
      // The next circuit starts from this one's details: that is a starting point, not something typed.
      draft.settle(getValues());
      setSaved(`Circuit ${v.number.trim()} saved on this phone.`);
      onAdded?.(circuitId);
    } catch (err) {
      setError((err as Error).message);
    }
  }

  const select = { select: { native: true }, inputLabel: { shrink: true } };
  return (
    <Paper variant="outlined" component="form" aria-label="Add a circuit" onSubmit={handleSubmit(add)} noValidate sx={{ p: 2 }}>
      <Stack spacing={1.5}>
        <Typography variant="h3">Add a circuit</Typography>
        <DraftNotice draft={draft} />
        {boards.length > 0 && (
          <TextField select label="Board" {...register('boardId')} slotProps={select}>
            {boards.map((b) => (
              <option key={b.id} value={b.id}>
                {b.name}
              </option>
            ))}
            <option value={NEW_BOARD}>Another board…</option>
          </TextField>
        )}
        {boardId === NEW_BOARD && (
          <TextField label="Board name" {...register('boardName')} error={!!errors.boardName} helperText={errors.boardName?.message ?? 'The board this circuit is fed from.'} />
        )}
        <TextField
          label="Circuit number"
          {...register('number', { onChange: () => setSaved('') })}
          error={!!errors.number}
          helperText={errors.number?.message ?? ' '}
          slotProps={{ htmlInput: { autoCapitalize: 'characters' } }}
        />
        <TextField label="Description" {...register('description')} error={!!errors.description} helperText={errors.description?.message} />
        <CircuitDetailFields register={register as unknown as UseFormRegister<CircuitDetails>} control={control as unknown as Control<CircuitDetails>} errors={errors as FieldErrors<CircuitDetails>} />
        {error && (
          <Typography color="error" role="alert">
            {error}
          </Typography>
        )}
        <Button type="submit" variant="contained" size="large">
          Add circuit
        </Button>
        <Typography variant="body2" color="text.secondary" role="status">
          {saved}
        </Typography>
      </Stack>
    </Paper>
  );
}
