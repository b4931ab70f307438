import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useEffect } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import type { InvoiceDetail } from '../api/get-invoice';
import { useSendInvoice } from '../api/change-invoice';
import { invoiceNameInText } from '../invoice-words';

export const sendSchema = z
  .object({
    to: z.string().trim().min(1, 'To: the e-mail address to send it to.').email('To: that is not an e-mail address.').max(254, 'To: at most 254 characters.'),
    cc: z.union([z.literal(''), z.string().trim().email('Copy to: that is not an e-mail address.').max(254, 'Copy to: at most 254 characters.')]),
    message: z.string().trim().max(2000, 'Your message: at most 2000 characters.'),
    linkDays: z
      .string()
      .regex(/^\d{1,2}$/, 'Link works for: a whole number of days.')
      .refine((v) => Number(v) >= 1 && Number(v) <= 90, 'Link works for: from 1 to 90 days.'),
  })
  .refine((v) => !v.cc.trim() || v.cc.trim().toLowerCase() !== v.to.trim().toLowerCase(), { path: ['cc'], message: 'Copy to: another address than To.' });
type Values = z.infer<typeof sendSchema>;

/**
 * E-mails an issued quote, invoice or credit note to the customer with a link to the job's record, where an invoice
 * can be paid by card; an invoice takes the job's issued certificates and reports with it.
 */
export function SendInvoiceDialog({ invoice, onClose, onSent }: { invoice: InvoiceDetail | null; onClose: () => void; onSent?: (to: string) => void }) {
  const send = useSendInvoice();
  const { register, handleSubmit, formState, reset } = useForm<Values>({ resolver: zodResolver(sendSchema) });
  useEffect(() => {
    if (invoice) reset({ to: invoice.customer?.email ?? '', cc: '', message: '', linkDays: '30' });
  }, [invoice, reset]);
  const close = () => {
    send.reset();
    onClose();
  };
  const submit = handleSubmit((v) =>
    send.mutate(
      { id: invoice!.id, to: v.to, linkDays: Number(v.linkDays), ...(v.cc.trim() ? { cc: v.cc.trim() } : {}), ...(v.message.trim() ? { message: v.message.trim() } : {}) },
      {
        onSuccess: () => {
          onSent?.(v.to);
          close();
        },
      },
    ),
  );
  const e = formState.errors;
  return (
    <Dialog open={!!invoice} onClose={close} fullWidth maxWidth="sm" aria-labelledby="send-invoice-title">
      <DialogTitle id="send-invoice-title">E-mail {invoice ? invoiceNameInText(invoice) : ''} to the customer</DialogTitle>
      <DialogContent>
        <Stack component="form" id="send-invoice-form" noValidate spacing={2} sx={{ pt: 1 }} onSubmit={submit}>
          <Typography color="text.secondary">
            The PDF goes as an attachment{invoice?.kind === 'invoice' ? ', with the job’s certificates and reports,' : ''} and a link to the job’s record
            {invoice?.kind === 'invoice' ? ' where it can be paid by card' : ''}.
          </Typography>
          {send.isError && <Alert severity="error">{send.error.message}</Alert>}
          <TextField label="To" type="email" autoComplete="email" {...register('to')} error={!!e.to} helperText={e.to?.message} />
          <TextField
            label="Copy to (optional)"
            type="email"
            autoComplete="off"
            {...register('cc')}
            error={!!e.cc}
            helperText={e.cc?.message ?? 'Someone else who should have it, such as the landlord or the customer’s accounts.'}
          />
          <TextField
            label="Your message (optional)"
            multiline
            minRows={3}
            {...register('message')}
            error={!!e.message}
            helperText={e.message?.message ?? 'Goes after the greeting, before what is attached.'}
          />
          <TextField label="Link works for (days)" inputMode="numeric" {...register('linkDays')} error={!!e.linkDays} helperText={e.linkDays?.message} sx={{ maxWidth: 240 }} />
        </Stack>
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2 }}>
        <Button onClick={close}>Cancel</Button>
        <Button type="submit" form="send-invoice-form" variant="contained" disabled={send.isPending}>
          Send
        </Button>
      </DialogActions>
    </Dialog>
  );
}
