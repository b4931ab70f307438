import { zodResolver } from '@hookform/resolvers/zod';
import DeleteOutlined from '@mui/icons-material/DeleteOutlined';
import Button from '@mui/material/Button';
import IconButton from '@mui/material/IconButton';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useMemo, useRef, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { DraftNotice } from '@/components/forms/draft-notice';
import { startingValues, useFormDraft } from '@/components/forms/form-draft';
import { parseReading, readingProblem, usableReading } from '@/lib/readings';
import { createRecord, deleteRecord } from '@/lib/sync/local-write';
import { useVisitParts } from '../data/get-parts';

const TYPED = 'typed';

/** Parts sold by the piece are counted: a price-list unit of "each", or a typed line with no unit. */
export const isCounted = (unit: string | null | undefined) => !unit?.trim() || unit.trim().toLowerCase() === 'each';

/** The form's rules, knowing the unit of each part on the price list: a counted part takes whole numbers only. */
export function partSchemaFor(unitOf: (priceItemId: string) => string | undefined) {
  return z
    .object({
      priceItemId: z.string(),
      description: z.string().max(200, 'The description must be at most 200 characters.'),
      quantity: z.string(),
      unit: z.string().max(20, 'The unit must be at most 20 characters.'),
    })
    .superRefine((v, ctx) => {
      const issue = (path: string, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
      if (!v.priceItemId) issue('priceItemId', 'Pick the part from the price list, or choose “Something else”.');
      if (v.priceItemId === TYPED && !v.description.trim()) issue('description', 'Say what the part is.');
      const unit = v.priceItemId === TYPED ? v.unit : unitOf(v.priceItemId);
      const quantity = parseReading(v.quantity);
      if (quantity === null) return issue('quantity', 'Enter the quantity.');
      if (Number.isNaN(quantity)) return issue('quantity', isCounted(unit) ? 'The quantity must be a number, like 2.' : 'The quantity must be a number, like 12.5.');
      if (isCounted(unit)) {
        if (!Number.isInteger(quantity) || quantity < 1) return issue('quantity', 'Count whole parts: 1 or more.');
      } else if (quantity <= 0) {
        return issue('quantity', `The quantity must be more than 0 ${unit!.trim()}.`);
      }
      const beyond = readingProblem('materialLine', 'quantity', v.quantity, 'The quantity');
      if (beyond) issue('quantity', beyond);
    });
}

type PartValues = z.infer<ReturnType<typeof partSchemaFor>>;
const EMPTY_PART: PartValues = { priceItemId: '', description: '', quantity: '1', unit: '' };

const quantityWords = (q: number, unit?: string | null) => `${Number.isInteger(q) ? q : q.toFixed(3).replace(/0+$/, '')}${unit && unit !== 'each' ? `\u00a0${unit}` : ''}`;

/** A quick parts list: pick from the organisation's price list (on the phone, so it works with no signal) or type a line. */
export function PartsUsed({ visitId, siteId, locked }: { visitId: string; siteId: string; locked: boolean }) {
  const parts = useVisitParts(visitId);
  // Read at each check, so the price list that arrives after the first render decides what is counted.
  const items = useRef(parts?.items);
  items.current = parts?.items;
  const resolver = useMemo(() => zodResolver(partSchemaFor((id) => items.current?.get(id)?.unit)), []);
  const draftKey = locked ? null : `part.new.${visitId}`;
  const { register, handleSubmit, formState, reset, control } = useForm<PartValues>({ resolver, defaultValues: startingValues(draftKey, EMPTY_PART) });
  const draft = useFormDraft(draftKey, useWatch({ control }) as PartValues, EMPTY_PART, reset);
  const [error, setError] = useState<string | null>(null);
  const chosen = useWatch({ control, name: 'priceItemId' });
  const item = parts?.items.get(chosen);
  const errors = formState.errors;

  async function add(v: PartValues) {
    setError(null);
    const picked = parts?.items.get(v.priceItemId);
    try {
      await createRecord('materialLine', {
        visitId,
        siteId,
        ...(picked ? { priceItemId: picked.id, description: picked.name, unit: picked.unit } : { description: v.description.trim(), ...(v.unit.trim() ? { unit: v.unit.trim() } : {}) }),
        quantity: usableReading(v.quantity)!,
      });
      reset(EMPTY_PART);
      draft.settle(EMPTY_PART);
    } catch (err) {
      setError((err as Error).message);
    }
  }

  if (!parts) return null;
  return (
    <Paper variant="outlined" sx={{ p: 1.5 }} component="section" aria-labelledby="parts-heading">
      <Stack spacing={1.5}>
        <Typography variant="h3" id="parts-heading">
          Parts used
        </Typography>
        {parts.lines.length === 0 ? (
          <Typography variant="body2" color="text.secondary">
            None recorded yet. The office prices them on the invoice.
          </Typography>
        ) : (
          <List dense disablePadding aria-label="Parts used on this visit">
            {parts.lines.map((l) => (
              <ListItem
                key={l.id}
                divider
                secondaryAction={
                  !locked && (
                    <IconButton edge="end" aria-label={`Remove ${l.description}`} onClick={() => deleteRecord('materialLine', l.id).catch((err: Error) => setError(err.message))}>
                      <DeleteOutlined />
                    </IconButton>
                  )
                }
              >
                <ListItemText primary={l.description} secondary={quantityWords(l.quantity, l.unit)} />
              </ListItem>
            ))}
          </List>
        )}
        {!locked && (
          <Stack component="form" aria-label="Add a part" noValidate onSubmit={handleSubmit(add)} spacing={1.5}>
            <DraftNotice draft={draft} />
            <TextField select label="Part" {...register('priceItemId')} error={!!errors.priceItemId} helperText={errors.priceItemId?.message} slotProps={{ select: { native: true }, inputLabel: { shrink: true } }}>
              <option value="">Choose…</option>
              {parts.catalogue.map((g) => (
                <optgroup key={g.category} label={g.category}>
                  {g.items.map((i) => (
                    <option key={i.id} value={i.id}>
                      {i.name}
                    </option>
                  ))}
                </optgroup>
              ))}
              <option value={TYPED}>Something else…</option>
            </TextField>
            {chosen === TYPED && (
              <Stack direction="row" spacing={1.5}>
                <TextField label="What it is" {...register('description')} error={!!errors.description} helperText={errors.description?.message ?? ' '} />
                <TextField label="Unit" placeholder="each" {...register('unit')} error={!!errors.unit} helperText={errors.unit?.message ?? ' '} sx={{ maxWidth: 110 }} />
              </Stack>
            )}
            <Stack direction="row" spacing={1.5} sx={{ alignItems: 'flex-start' }}>
              <TextField
                label={`Quantity${item && item.unit !== 'each' ? ` (${item.unit})` : ''}`}
                {...register('quantity')}
                error={!!errors.quantity}
                helperText={errors.quantity?.message ?? ' '}
                slotProps={{ htmlInput: { inputMode: 'decimal' } }}
              />
              <Button type="submit" variant="outlined" size="large" sx={{ minHeight: 56, flexShrink: 0 }}>
                Add part
              </Button>
            </Stack>
            {error && (
              <Typography color="error" role="alert">
                {error}
              </Typography>
            )}
          </Stack>
        )}
      </Stack>
    </Paper>
  );
}
