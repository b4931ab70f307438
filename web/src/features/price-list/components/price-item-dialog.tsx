import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import FormControlLabel from '@mui/material/FormControlLabel';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import TextField from '@mui/material/TextField';
import { useEffect } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { z } from 'zod';
import { MONEY_TEXT, moneyText, penceOf } from '@/lib/money-text';
import { useVatRates, vatRateLabel } from '@/lib/vat-rates';
import type { PriceItem } from '@/lib/price-list';
import { useSavePriceItem } from '../api/save-price-item';

const money = (label: string) => z.string().trim().refine((v) => v === '' || MONEY_TEXT.test(v), `${label}: enter pounds and pence, like 12.50.`);

export const priceItemSchema = z.object({
  name: z.string().trim().min(1, 'Name: say what the item is.').max(200, 'Name: at most 200 characters.'),
  unit: z.string().trim().min(1, 'Unit: say what one of it is, like each or m.').max(20, 'Unit: at most 20 characters.'),
  category: z.string().trim().max(60, 'Category: at most 60 characters.'),
  code: z.string().trim().max(40, 'Code: at most 40 characters.'),
  cost: money('Cost'),
  sell: money('Sell price').refine((v) => v !== '', 'Sell price: enter what one unit is charged at, before VAT.'),
  vatRateCode: z.string().min(1, 'VAT rate: choose one.'),
  active: z.boolean(),
});
type Values = z.infer<typeof priceItemSchema>;

const valuesOf = (item: PriceItem | null, defaultVat: string): Values => ({
  name: item?.name ?? '',
  unit: item?.unit ?? 'each',
  category: item?.category ?? '',
  code: item?.code ?? '',
  cost: moneyText(item?.costMinor),
  sell: moneyText(item?.sellMinor),
  vatRateCode: item?.vatRateCode ?? defaultVat,
  active: item?.active ?? true,
});

interface Props {
  open: boolean;
  /** The item to change; a new one when null. */
  item: PriceItem | null;
  onClose: () => void;
  onSaved?: (item: PriceItem) => void;
}

/** Adds or changes a line of the price list; prices are typed in pounds and pence, before VAT. */
export function PriceItemDialog({ open, item, onClose, onSaved }: Props) {
  const save = useSavePriceItem();
  const rates = useVatRates();
  const offered = (rates.data?.items ?? []).filter((r) => r.active || r.code === item?.vatRateCode);
  const defaultVat = offered.find((r) => r.code === 'standard')?.code ?? offered[0]?.code ?? '';
  const { register, control, handleSubmit, formState, reset } = useForm<Values>({ resolver: zodResolver(priceItemSchema), defaultValues: valuesOf(item, defaultVat) });
  useEffect(() => {
    if (open) reset(valuesOf(item, defaultVat));
  }, [open, item, defaultVat, reset]);
  const close = () => {
    save.reset();
    onClose();
  };
  const submit = handleSubmit((v) =>
    save.mutate(
      {
        id: item?.id,
        fields: {
          name: v.name,
          unit: v.unit,
          category: v.category || null,
          code: v.code || null,
          costMinor: v.cost ? penceOf(v.cost) : null,
          sellMinor: penceOf(v.sell),
          vatRateCode: v.vatRateCode,
          active: v.active,
        },
      },
      {
        onSuccess: (saved) => {
          onSaved?.(saved);
          close();
        },
      },
    ),
  );
  const e = formState.errors;
  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="sm" aria-labelledby="price-item-title">
      <DialogTitle id="price-item-title">{item ? `Change ${item.name}` : 'Add to the price list'}</DialogTitle>
      <DialogContent>
        <Stack component="form" id="price-item-form" noValidate spacing={2} sx={{ pt: 1 }} onSubmit={submit}>
          {save.isError && <Alert severity="error">{save.error.message}</Alert>}
          <TextField label="Name" {...register('name')} error={!!e.name} helperText={e.name?.message} />
          <Stack direction="row" spacing={2}>
            <TextField label="Unit" {...register('unit')} error={!!e.unit} helperText={e.unit?.message ?? 'each, m, box of 100'} />
            <TextField label="Category" {...register('category')} error={!!e.category} helperText={e.category?.message} />
            <TextField label="Code" {...register('code')} error={!!e.code} helperText={e.code?.message} />
          </Stack>
          <Stack direction="row" spacing={2}>
            <TextField label="Cost (£)" inputMode="decimal" {...register('cost')} error={!!e.cost} helperText={e.cost?.message ?? 'What one unit costs you'} />
            <TextField label="Sell price (£)" inputMode="decimal" {...register('sell')} error={!!e.sell} helperText={e.sell?.message ?? 'Charged for one unit, before VAT'} />
            <Controller
              control={control}
              name="vatRateCode"
              render={({ field }) => (
                <TextField select label="VAT rate" {...field} error={!!e.vatRateCode} helperText={e.vatRateCode?.message}>
                  {offered.map((r) => (
                    <MenuItem key={r.code} value={r.code}>
                      {vatRateLabel(r)}
                    </MenuItem>
                  ))}
                </TextField>
              )}
            />
          </Stack>
          <Controller
            control={control}
            name="active"
            render={({ field }) => <FormControlLabel control={<Switch checked={field.value} onChange={(_, on) => field.onChange(on)} />} label="Offered to technicians for new parts" />}
          />
        </Stack>
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2 }}>
        <Button onClick={close}>Cancel</Button>
        <Button type="submit" form="price-item-form" variant="contained" disabled={save.isPending}>
          {item ? 'Save' : 'Add'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
