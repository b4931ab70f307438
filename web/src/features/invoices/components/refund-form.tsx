import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { formatMoney, refundProblems, toRefundMinor } from '@wiretrail/core';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { v7 as uuidv7 } from 'uuid';
import { z } from 'zod';
import { DateInput } from '@/components/forms/date-inputs';
import { MONEY_TEXT, moneyText, penceOf } from '@/lib/money-text';
import { useRecordRefund } from '../api/change-invoice';
import type { InvoiceDetail } from '../api/get-invoice';
import { dateWords, REFUND_METHOD_NAMES } from '../invoice-words';
import { localToday } from './payment-form';

const BY_HAND = ['bank-transfer', 'cash', 'cheque'] as const;

/** A card payment of the invoice and what is left of it to give back. */
export interface CardRoom {
  paymentId: string;
  receivedOn: string;
  leftMinor: number;
}

/** What each card payment can still take back: what it brought, less what already went back to it. */
export function cardRooms(invoice: Pick<InvoiceDetail, 'payments' | 'refunds'>): CardRoom[] {
  return invoice.payments
    .filter((p) => p.method === 'card')
    .map((p) => ({
      paymentId: p.id,
      receivedOn: p.receivedOn,
      leftMinor: p.amountMinor - p.refundMinor - invoice.refunds.filter((r) => r.paymentId === p.id && r.state !== 'failed').reduce((s, r) => s + r.amountMinor, 0),
    }))
    .filter((c) => c.leftMinor > 0);
}

/** The office's words for core's refusal: "Amount: …" in place of the API's field name. */
const inWords = (problem: string) => problem.replace(/^amountMinor: (.)/, (_, first: string) => `Amount: ${first}`);

/** More than nothing, never more than the customer is owed back, and back to a card never more than that payment brought. */
export function refundSchema(toRefund: number, number: string, rooms: CardRoom[], today: string) {
  return z
    .object({
      amount: z.string().trim().regex(MONEY_TEXT, 'Amount: pounds and pence, like 50.00.'),
      how: z.string().min(1, 'How it goes back: choose one.'),
      refundedOn: z
        .string()
        .regex(/^\d{4}-\d{2}-\d{2}$/, 'Refunded on: the day the money went back.')
        .refine((v) => v <= today, 'Refunded on: cannot be later than today.'),
      reference: z.string().trim().max(100, 'Reference: at most 100 characters.'),
      note: z.string().trim().max(500, 'Note: at most 500 characters.'),
    })
    .superRefine((v, ctx) => {
      if (!MONEY_TEXT.test(v.amount)) return;
      const room = v.how.startsWith('card:') ? rooms.find((r) => `card:${r.paymentId}` === v.how) : undefined;
      const problems = refundProblems({ amountMinor: penceOf(v.amount), toRefundMinor: toRefund, invoiceNumber: number, cardLeftMinor: room?.leftMinor });
      for (const p of problems) ctx.addIssue({ code: 'custom', path: ['amount'], message: inWords(p) });
    });
}
type Values = z.infer<ReturnType<typeof refundSchema>>;

interface Props {
  invoice: Pick<InvoiceDetail, 'id' | 'number' | 'account' | 'payments' | 'refunds'>;
  today?: string;
  onDone: (saved: InvoiceDetail) => void;
  onCancel: () => void;
}

/**
 * Gives money back to the customer: by bank transfer, cash or cheque (recorded as done), or back to one of the
 * invoice's card payments through the card payment service. The form keeps one request id, so a second click
 * records and refunds once.
 */
export function RefundForm({ invoice, today = localToday(), onDone, onCancel }: Props) {
  const toRefund = invoice.account ? toRefundMinor(invoice.account) : 0;
  const rooms = cardRooms(invoice);
  const [requestId] = useState(() => uuidv7());
  const record = useRecordRefund();
  const { register, control, handleSubmit, formState, watch } = useForm<Values>({
    resolver: zodResolver(refundSchema(toRefund, invoice.number ?? 'the invoice', rooms, today)),
    defaultValues: { amount: moneyText(toRefund), how: 'bank-transfer', refundedOn: today, reference: '', note: '' },
  });
  const e = formState.errors;
  const toCard = watch('how').startsWith('card:');
  const submit = handleSubmit((v) => {
    const card = v.how.startsWith('card:') ? v.how.slice('card:'.length) : null;
    record.mutate(
      {
        id: invoice.id,
        amountMinor: penceOf(v.amount),
        requestId,
        ...(card ? { method: 'card' as const, paymentId: card } : { method: v.how as (typeof BY_HAND)[number], refundedOn: v.refundedOn, ...(v.reference ? { reference: v.reference } : {}) }),
        ...(v.note ? { note: v.note } : {}),
      },
      { onSuccess: onDone },
    );
  });
  return (
    <Stack component="form" aria-label={`Record a refund on ${invoice.number ?? 'the invoice'}`} noValidate spacing={2} onSubmit={submit}>
      {record.isError && <Alert severity="error">{record.error.message}</Alert>}
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: 'flex-start' }}>
        <TextField label="Amount (£)" inputMode="decimal" {...register('amount')} error={!!e.amount} helperText={e.amount?.message ?? `${formatMoney(toRefund)} is owed back`} />
        <TextField select label="How it goes back" {...register('how')} error={!!e.how} helperText={e.how?.message} slotProps={{ select: { native: true }, inputLabel: { shrink: true } }}>
          {BY_HAND.map((m) => (
            <option key={m} value={m}>
              {REFUND_METHOD_NAMES[m]}
            </option>
          ))}
          {rooms.map((r) => (
            <option key={r.paymentId} value={`card:${r.paymentId}`}>
              {`${REFUND_METHOD_NAMES.card} paid on ${dateWords(r.receivedOn)} (${formatMoney(r.leftMinor)} left)`}
            </option>
          ))}
        </TextField>
        {!toCard && (
          <Controller control={control} name="refundedOn" render={({ field }) => <DateInput label="Refunded on" {...field} max={today} error={!!e.refundedOn} helperText={e.refundedOn?.message} />} />
        )}
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: 'flex-start' }}>
        {!toCard && <TextField label="Reference" {...register('reference')} error={!!e.reference} helperText={e.reference?.message ?? 'Transfer reference, cheque number'} />}
        <TextField label="Note" {...register('note')} error={!!e.note} helperText={e.note?.message} />
      </Stack>
      {toCard && <Alert severity="info">The card payment service gives the money back to the card now; the customer sees it in a few days.</Alert>}
      <Stack direction="row" spacing={1.5} sx={{ justifyContent: 'flex-end' }}>
        <Button onClick={onCancel}>Cancel</Button>
        <Button type="submit" variant="contained" disabled={record.isPending}>
          Record refund
        </Button>
      </Stack>
    </Stack>
  );
}
