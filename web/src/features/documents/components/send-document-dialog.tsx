import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Checkbox from '@mui/material/Checkbox';
import FormControl from '@mui/material/FormControl';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormGroup from '@mui/material/FormGroup';
import FormLabel from '@mui/material/FormLabel';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useEffect } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { z } from 'zod';
import type { JobDocument } from '../api/get-job-documents';
import { useSendDocument } from '../api/send-document';
import { documentName } from '../document-words';

export const LINK_DAYS = [7, 14, 30, 60, 90] as const;

export const sendSchema = z
  .object({
    to: z.string().trim().min(1, 'To: enter the e-mail address to send it to.').email('To: that is not an e-mail address.').max(254, 'To: at most 254 characters.'),
    cc: z.union([z.literal(''), z.string().trim().email('Copy to: that is not an e-mail address.').max(254, 'Copy to: at most 254 characters.')]),
    message: z.string().trim().max(2000, 'Your message: at most 2000 characters.'),
    linkDays: z.number({ message: 'Link works for: choose how many days.' }).int().min(1, 'Link works for: at least 1 day.').max(90, 'Link works for: at most 90 days.'),
    also: z.array(z.string()),
  })
  .refine((v) => !v.cc.trim() || v.cc.trim().toLowerCase() !== v.to.trim().toLowerCase(), { path: ['cc'], message: 'Copy to: another address than To.' });
type Values = z.infer<typeof sendSchema>;

interface Props {
  jobId: string;
  /** The document to send; the dialog is open while there is one. */
  doc: JobDocument | null;
  /** The job's other issued documents, which can go in the same e-mail. */
  others?: JobDocument[];
  /** Where it goes unless the office types another address: the customer's e-mail. */
  defaultTo: string | null;
  customerName?: string | null;
  onClose: () => void;
  onSent?: (to: string) => void;
}

/** E-mails an issued document to the customer, with a link to the job's record that works for the days chosen. */
export function SendDocumentDialog({ jobId, doc, others = [], defaultTo, customerName, onClose, onSent }: Props) {
  const send = useSendDocument(jobId);
  const blank = { to: defaultTo ?? '', cc: '', message: '', linkDays: 30, also: [] as string[] };
  const { register, control, handleSubmit, formState, reset } = useForm<Values>({ resolver: zodResolver(sendSchema), defaultValues: blank });
  // Each time it opens, it starts from the customer's address and this document alone.
  useEffect(() => {
    if (doc) reset({ to: defaultTo ?? '', cc: '', message: '', linkDays: 30, also: [] });
  }, [doc, defaultTo, reset]);
  const offered = others.filter((o) => o.id !== doc?.id && o.issuedAt && !o.supersededAt);
  const close = () => {
    send.reset();
    onClose();
  };
  const submit = handleSubmit((v) =>
    send.mutate(
      {
        documentIds: [doc!.id, ...offered.filter((o) => v.also.includes(o.id)).map((o) => o.id)],
        to: v.to,
        linkDays: v.linkDays,
        ...(v.cc.trim() ? { cc: v.cc.trim() } : {}),
        ...(v.message.trim() ? { message: v.message.trim() } : {}),
      },
      {
        onSuccess: () => {
          onSent?.(v.to);
          close();
        },
      },
    ),
  );
  return (
    <Dialog open={!!doc} onClose={close} fullWidth maxWidth="sm" aria-labelledby="send-document-title">
      <DialogTitle id="send-document-title">E-mail {doc ? `${documentName(doc).toLowerCase()} ${doc.number}` : ''} to the customer</DialogTitle>
      <DialogContent>
        <Stack component="form" id="send-document-form" noValidate spacing={2} sx={{ pt: 1 }} onSubmit={submit}>
          <Typography color="text.secondary">
            The PDF goes as an attachment (with any others you tick), with a link to the job’s record (its photos and documents) that stops working after the days you choose.
            {customerName && defaultTo ? ` ${customerName}’s address is filled in.` : ''}
          </Typography>
          {send.isError && <Alert severity="error">{send.error.message}</Alert>}
          <TextField label="To" type="email" autoComplete="email" {...register('to')} error={!!formState.errors.to} helperText={formState.errors.to?.message} />
          <TextField
            label="Copy to (optional)"
            type="email"
            autoComplete="off"
            {...register('cc')}
            error={!!formState.errors.cc}
            helperText={formState.errors.cc?.message ?? 'Someone else who should have it, such as the landlord or the customer’s accounts.'}
          />
          {offered.length > 0 && (
            <Controller
              control={control}
              name="also"
              render={({ field }) => (
                <FormControl component="fieldset">
                  <FormLabel component="legend">Attach as well</FormLabel>
                  <FormGroup>
                    {offered.map((o) => (
                      <FormControlLabel
                        key={o.id}
                        label={`${documentName(o)} ${o.number}`}
                        control={
                          <Checkbox
                            checked={field.value.includes(o.id)}
                            onChange={(e) => field.onChange(e.target.checked ? [...field.value, o.id] : field.value.filter((id) => id !== o.id))}
                          />
                        }
                      />
                    ))}
                  </FormGroup>
                </FormControl>
              )}
            />
          )}
          <TextField
            label="Your message (optional)"
            multiline
            minRows={3}
            {...register('message')}
            error={!!formState.errors.message}
            helperText={formState.errors.message?.message ?? 'Goes after the greeting, before the list of what is attached.'}
          />
          <Controller
            control={control}
            name="linkDays"
            render={({ field }) => (
              <TextField
                select
                label="Link works for"
                value={field.value}
                onChange={(e) => field.onChange(Number(e.target.value))}
                onBlur={field.onBlur}
                error={!!formState.errors.linkDays}
                helperText={formState.errors.linkDays?.message}
              >
                {LINK_DAYS.map((d) => (
                  <MenuItem key={d} value={d}>
                    {d} days
                  </MenuItem>
                ))}
              </TextField>
            )}
          />
        </Stack>
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2 }}>
        <Button onClick={close}>Cancel</Button>
        <Button type="submit" form="send-document-form" variant="contained" disabled={send.isPending}>
          Send
        </Button>
      </DialogActions>
    </Dialog>
  );
}
