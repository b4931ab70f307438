import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { formatMoney } from '@wiretrail/core';
import { Controller, useForm } from 'react-hook-form';
import { z } from 'zod';
import { DateInput } from '@/components/forms/date-inputs';
import { MONEY_TEXT, moneyText, penceOf } from '@/lib/money-text';
import type { InvoiceDetail } from '../api/get-invoice';
import { useRecordPayment } from '../api/change-invoice';
import { METHOD_NAMES } from '../invoice-words';

const METHODS = ['bank-transfer', 'cash', 'cheque'] as const;

/** Money taken on site or paid into the bank: more than nothing, no more than is owed, not on a day still to come. */
export function paymentSchema(owedMinor: number, today: string) {
  return z.object({
    amount: z
      .string()
      .trim()
      .regex(MONEY_TEXT, 'Amount: pounds and pence, like 150.00.')
      .refine((v) => !MONEY_TEXT.test(v) || penceOf(v) > 0, 'Amount: must be more than nothing.')
      .refine((v) => !MONEY_TEXT.test(v) || penceOf(v) <= owedMinor, `Amount: more than the ${formatMoney(owedMinor)} still owed.`),
    method: z.enum(METHODS, { message: 'How it was paid: choose one.' }),
    receivedOn: z
      .string()
      .regex(/^\d{4}-\d{2}-\d{2}$/, 'Received on: the day the money came in.')
      .refine((v) => v <= today, 'Received on: cannot be later than today.'),
    reference: z.string().trim().max(100, 'Reference: at most 100 characters.'),
    note: z.string().trim().max(500, 'Note: at most 500 characters.'),
  });
}
type Values = z.infer<ReturnType<typeof paymentSchema>>;

/** Today's date on this device, YYYY-MM-DD. */
export const localToday = () => new Date().toLocaleDateString('en-CA');

interface Props {
  invoice: Pick<InvoiceDetail, 'id' | 'number' | 'account'>;
  today?: string;
  onDone: (saved: InvoiceDetail) => void;
  onCancel: () => void;
}

/** Records a payment made other than by card: cash, bank transfer or cheque. */
export function PaymentForm({ invoice, today = localToday(), onDone, onCancel }: Props) {
  const owed = invoice.account?.owedMinor ?? 0;
  const record = useRecordPayment();
  const { register, control, handleSubmit, formState } = useForm<Values>({
    resolver: zodResolver(paymentSchema(owed, today)),
    defaultValues: { amount: moneyText(owed), method: 'bank-transfer', receivedOn: today, reference: '', note: '' },
  });
  const e = formState.errors;
  const submit = handleSubmit((v) =>
    record.mutate(
      { id: invoice.id, amountMinor: penceOf(v.amount), method: v.method, receivedOn: v.receivedOn, ...(v.reference ? { reference: v.reference } : {}), ...(v.note ? { note: v.note } : {}) },
      { onSuccess: onDone },
    ),
  );
  return (
    <Stack component="form" aria-label={`Record a payment against ${invoice.number ?? 'the invoice'}`} noValidate spacing={2} onSubmit={submit}>
      {record.isError && <Alert severity="error">{record.error.message}</Alert>}
      <Stack direction="row" spacing={2} sx={{ alignItems: 'flex-start' }}>
        <TextField label="Amount (£)" inputMode="decimal" {...register('amount')} error={!!e.amount} helperText={e.amount?.message ?? `${formatMoney(owed)} is owed`} />
        <TextField select label="How it was paid" {...register('method')} error={!!e.method} helperText={e.method?.message} slotProps={{ select: { native: true }, inputLabel: { shrink: true } }}>
          {METHODS.map((m) => (
            <option key={m} value={m}>
              {METHOD_NAMES[m]}
            </option>
          ))}
        </TextField>
        <Controller control={control} name="receivedOn" render={({ field }) => <DateInput label="Received on" {...field} max={today} error={!!e.receivedOn} helperText={e.receivedOn?.message} />} />
      </Stack>
      <Stack direction="row" spacing={2} sx={{ alignItems: 'flex-start' }}>
        <TextField label="Reference" {...register('reference')} error={!!e.reference} helperText={e.reference?.message ?? 'Cheque number, transfer reference'} />
        <TextField label="Note" {...register('note')} error={!!e.note} helperText={e.note?.message} />
      </Stack>
      <Stack direction="row" spacing={1.5} sx={{ justifyContent: 'flex-end' }}>
        <Button onClick={onCancel}>Cancel</Button>
        <Button type="submit" variant="contained" disabled={record.isPending}>
          Record payment
        </Button>
      </Stack>
    </Stack>
  );
}
