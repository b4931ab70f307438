import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import FormControlLabel from '@mui/material/FormControlLabel';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import TextField from '@mui/material/TextField';
import { formatMoney } from '@wiretrail/core';
import { useEffect, useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { z } from 'zod';
import { MONEY_TEXT, moneyText, penceOf } from '@/lib/money-text';
import { useVatRates, vatRateLabel } from '@/lib/vat-rates';
import { type LabourRate, useLabourRates } from '@/lib/labour-rates';
import { useSaveLabourRate } from '../api/save-labour-rate';
import { RatesCard } from './rates-card';

export const labourRateSchema = z.object({
  name: z.string().trim().min(1, 'Name: say who or what the rate is for, like Electrician.').max(100, 'Name: at most 100 characters.'),
  hourly: z.string().trim().regex(MONEY_TEXT, 'Per hour: enter pounds and pence, like 52.00.'),
  vatRateCode: z.string().min(1, 'VAT rate: choose one.'),
  isDefault: z.boolean(),
  active: z.boolean(),
});
type Values = z.infer<typeof labourRateSchema>;

function LabourRateDialog({ rate, open, onClose }: { rate: LabourRate | null; open: boolean; onClose: () => void }) {
  const save = useSaveLabourRate();
  const vat = useVatRates();
  const offered = (vat.data?.items ?? []).filter((r) => r.active || r.code === rate?.vatRateCode);
  const { register, control, handleSubmit, formState, reset } = useForm<Values>({ resolver: zodResolver(labourRateSchema) });
  useEffect(() => {
    if (open) reset({ name: rate?.name ?? '', hourly: moneyText(rate?.hourlyMinor), vatRateCode: rate?.vatRateCode ?? 'standard', isDefault: rate?.isDefault ?? false, active: rate?.active ?? true });
  }, [open, rate, reset]);
  const close = () => {
    save.reset();
    onClose();
  };
  const submit = handleSubmit((v) =>
    save.mutate(
      { id: rate?.id, fields: { name: v.name, hourlyMinor: penceOf(v.hourly), vatRateCode: v.vatRateCode, isDefault: v.isDefault, ...(rate ? { active: v.active } : {}) } },
      { onSuccess: close },
    ),
  );
  const e = formState.errors;
  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="xs" aria-labelledby="labour-rate-title">
      <DialogTitle id="labour-rate-title">{rate ? `Change ${rate.name}` : 'Add a labour rate'}</DialogTitle>
      <DialogContent>
        <Stack component="form" id="labour-rate-form" noValidate spacing={2} sx={{ pt: 1 }} onSubmit={submit}>
          {save.isError && <Alert severity="error">{save.error.message}</Alert>}
          <TextField label="Name" {...register('name')} error={!!e.name} helperText={e.name?.message} />
          <TextField label="Per hour (£)" inputMode="decimal" {...register('hourly')} error={!!e.hourly} helperText={e.hourly?.message ?? 'Before VAT'} />
          <Controller
            control={control}
            name="vatRateCode"
            render={({ field }) => (
              <TextField select label="VAT rate" {...field} value={field.value ?? ''} error={!!e.vatRateCode} helperText={e.vatRateCode?.message}>
                {offered.map((r) => (
                  <MenuItem key={r.code} value={r.code}>
                    {vatRateLabel(r)}
                  </MenuItem>
                ))}
              </TextField>
            )}
          />
          <Controller
            control={control}
            name="isDefault"
            render={({ field }) => (
              <FormControlLabel control={<Switch checked={!!field.value} onChange={(_, on) => field.onChange(on)} />} label="Price a visit’s time on site at this rate" />
            )}
          />
          {rate && (
            <Controller
              control={control}
              name="active"
              render={({ field }) => <FormControlLabel control={<Switch checked={!!field.value} onChange={(_, on) => field.onChange(on)} />} label="Offered for new lines" />}
            />
          )}
        </Stack>
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2 }}>
        <Button onClick={close}>Cancel</Button>
        <Button type="submit" form="labour-rate-form" variant="contained" disabled={save.isPending}>
          {rate ? 'Save' : 'Add'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}

/** What an hour of each kind of labour is charged at; the default one prices a visit's time on site. */
export function LabourRatesCard() {
  const rates = useLabourRates();
  const [editing, setEditing] = useState<LabourRate | 'new' | null>(null);
  return (
    <>
      <RatesCard
        title="Labour rates"
        about="Labour on an invoice is the time on site the technician recorded, in quarter hours, times the default rate."
        addLabel="Add a labour rate"
        onAdd={() => setEditing('new')}
        error={rates.error?.message}
        loading={rates.isPending}
        columns={['Name', 'Per hour', 'VAT', 'Offered']}
        rows={(rates.data?.items ?? []).map((r) => ({
          key: r.id,
          name: r.name,
          cells: [
            <Stack key="name" direction="row" spacing={1} sx={{ alignItems: 'center' }}>
              <span>{r.name}</span>
              {r.isDefault && <Chip size="small" color="secondary" label="Default" />}
            </Stack>,
            formatMoney(r.hourlyMinor),
            r.vatRateCode,
            r.active ? 'Yes' : 'No',
          ],
          onChange: () => setEditing(r),
        }))}
      />
      <LabourRateDialog open={editing !== null} rate={editing === 'new' ? null : editing} onClose={() => setEditing(null)} />
    </>
  );
}
