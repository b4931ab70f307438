import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import FormControlLabel from '@mui/material/FormControlLabel';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import TextField from '@mui/material/TextField';
import { formatRate } from '@wiretrail/core';
import { useEffect, useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { z } from 'zod';
import { basisPointsOf, PERCENT_TEXT, percentText } from '@/lib/money-text';
import { useVatRates, type VatRate } from '@/lib/vat-rates';
import { useSaveVatRate } from '../api/save-vat-rate';
import { RatesCard } from './rates-card';

export const vatRateSchema = z.object({
  code: z.string().trim().regex(/^[a-z0-9][a-z0-9-]{0,19}$/, 'Code: 1 to 20 lower-case letters, digits or dashes, like standard.'),
  name: z.string().trim().min(1, 'Name: say what the rate is, like Standard rate.').max(60, 'Name: at most 60 characters.'),
  percent: z
    .string()
    .trim()
    .regex(PERCENT_TEXT, 'Rate: a per cent with at most two decimal places, like 20 or 17.5.')
    .refine((v) => !PERCENT_TEXT.test(v) || basisPointsOf(v) <= 10_000, 'Rate: at most 100 %.'),
  active: z.boolean(),
});
type Values = z.infer<typeof vatRateSchema>;

function VatRateDialog({ rate, open, onClose }: { rate: VatRate | null; open: boolean; onClose: () => void }) {
  const save = useSaveVatRate();
  const { register, control, handleSubmit, formState, reset } = useForm<Values>({ resolver: zodResolver(vatRateSchema) });
  useEffect(() => {
    if (open) reset({ code: rate?.code ?? '', name: rate?.name ?? '', percent: rate ? percentText(rate.basisPoints) : '', active: rate?.active ?? true });
  }, [open, rate, reset]);
  const close = () => {
    save.reset();
    onClose();
  };
  const submit = handleSubmit((v) => {
    const fields = { name: v.name, basisPoints: basisPointsOf(v.percent) };
    save.mutate(rate ? { id: rate.id, fields: { ...fields, active: v.active } } : { fields: { ...fields, code: v.code } }, { onSuccess: close });
  });
  const e = formState.errors;
  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="xs" aria-labelledby="vat-rate-title">
      <DialogTitle id="vat-rate-title">{rate ? `Change ${rate.name.toLowerCase()}` : 'Add a VAT rate'}</DialogTitle>
      <DialogContent>
        <Stack component="form" id="vat-rate-form" noValidate spacing={2} sx={{ pt: 1 }} onSubmit={submit}>
          {save.isError && <Alert severity="error">{save.error.message}</Alert>}
          <TextField label="Code" disabled={!!rate} {...register('code')} error={!!e.code} helperText={e.code?.message ?? 'What price items and lines name it by; it cannot change later.'} />
          <TextField label="Name" {...register('name')} error={!!e.name} helperText={e.name?.message} />
          <TextField label="Rate (%)" inputMode="decimal" {...register('percent')} error={!!e.percent} helperText={e.percent?.message ?? 'Lines issued from now on take it; issued invoices keep the rate they were issued at.'} />
          {rate && (
            <Controller
              control={control}
              name="active"
              render={({ field }) => <FormControlLabel control={<Switch checked={field.value} onChange={(_, on) => field.onChange(on)} />} label="Offered for new lines" />}
            />
          )}
        </Stack>
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2 }}>
        <Button onClick={close}>Cancel</Button>
        <Button type="submit" form="vat-rate-form" variant="contained" disabled={save.isPending}>
          {rate ? 'Save' : 'Add'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}

/** The organisation's VAT rates: data the office keeps, so a change of rate is an edit here, not a new release. */
export function VatRatesCard() {
  const rates = useVatRates();
  const [editing, setEditing] = useState<VatRate | 'new' | null>(null);
  return (
    <>
      <RatesCard
        title="VAT rates"
        about="Each price item and line names one of these. A change of rate applies to what is issued from then on."
        addLabel="Add a VAT rate"
        onAdd={() => setEditing('new')}
        error={rates.error?.message}
        loading={rates.isPending}
        columns={['Name', 'Code', 'Rate', 'Offered']}
        rows={(rates.data?.items ?? []).map((r) => ({
          key: r.id,
          name: r.name,
          cells: [r.name, r.code, formatRate(r.basisPoints), r.active ? 'Yes' : 'No'],
          onChange: () => setEditing(r),
        }))}
      />
      <VatRateDialog open={editing !== null} rate={editing === 'new' ? null : editing} onClose={() => setEditing(null)} />
    </>
  );
}
