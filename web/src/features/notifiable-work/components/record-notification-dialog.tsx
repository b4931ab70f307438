import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { type NotifiableJob, NOTIFICATION_STATE_WORDS, NOTIFICATION_STATES } from '@wiretrail/core';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { DateInput } from '@/components/forms/date-inputs';
import { useRecordNotification } from '../api/record-notification';

const DAY = /^\d{4}-\d{2}-\d{2}$/;

/** What the office records of a notification: a state, and the reference and days that state needs. */
export function notificationSchema(today: string, completedOn: string | null) {
  const day = (what: string) =>
    z
      .string()
      .refine((v) => !v || DAY.test(v), `${what}: a date.`)
      .refine((v) => !v || v <= today, `${what}: cannot be later than today.`)
      .refine((v) => !v || !completedOn || v >= completedOn, `${what}: cannot be before the work was finished.`);
  return z
    .object({
      state: z.enum(NOTIFICATION_STATES),
      schemeRef: z.string().trim().max(60, 'Scheme reference: at most 60 characters.'),
      notifiedOn: day('Notified on'),
      certificateReceivedOn: day('Certificate received on'),
    })
    .superRefine((v, ctx) => {
      if (v.state === 'to-notify') return;
      if (!v.schemeRef) ctx.addIssue({ code: 'custom', path: ['schemeRef'], message: 'Scheme reference: give the reference the scheme gave.' });
      if (!v.notifiedOn) ctx.addIssue({ code: 'custom', path: ['notifiedOn'], message: 'Notified on: give the day.' });
      if (v.state === 'certificate-received' && !v.certificateReceivedOn) ctx.addIssue({ code: 'custom', path: ['certificateReceivedOn'], message: 'Certificate received on: give the day.' });
      if (v.notifiedOn && v.certificateReceivedOn && v.certificateReceivedOn < v.notifiedOn) {
        ctx.addIssue({ code: 'custom', path: ['certificateReceivedOn'], message: 'Certificate received on: cannot be before it was notified.' });
      }
    });
}
type Values = z.infer<ReturnType<typeof notificationSchema>>;

const localToday = () => new Date().toLocaleDateString('en-CA');

/** Records that a job's work was notified, and later that the customer's compliance certificate came. */
export function RecordNotificationDialog({ job, onClose, today = localToday() }: { job: NotifiableJob; onClose: () => void; today?: string }) {
  const record = useRecordNotification();
  const { register, handleSubmit, formState, control } = useForm<Values>({
    resolver: zodResolver(notificationSchema(today, job.completedOn)),
    defaultValues: {
      state: job.state === 'to-notify' ? 'notified' : job.state,
      schemeRef: job.schemeRef ?? '',
      notifiedOn: job.notifiedOn ?? today,
      certificateReceivedOn: job.certificateReceivedOn ?? (job.state === 'notified' ? today : ''),
    },
  });
  const state = useWatch({ control, name: 'state' });
  const e = formState.errors;
  const submit = handleSubmit((v) =>
    record.mutate(
      {
        jobId: job.jobId,
        change: {
          state: v.state,
          ...(v.state !== 'to-notify' ? { schemeRef: v.schemeRef, notifiedOn: v.notifiedOn } : {}),
          ...(v.state === 'certificate-received' ? { certificateReceivedOn: v.certificateReceivedOn } : {}),
        },
      },
      { onSuccess: onClose },
    ),
  );
  const name = [job.reference, job.title].filter(Boolean).join(' · ');
  return (
    <Dialog open onClose={onClose} aria-labelledby="record-notification-title" fullWidth maxWidth="sm">
      <Stack component="form" aria-label={`Notification of ${name}`} noValidate onSubmit={submit}>
        <DialogTitle id="record-notification-title">Notification of {name}</DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ pt: 1 }}>
            {record.isError && <Alert severity="error">{record.error.message}</Alert>}
            <TextField select label="Where it stands" {...register('state')} slotProps={{ select: { native: true }, inputLabel: { shrink: true } }}>
              {NOTIFICATION_STATES.map((s) => (
                <option key={s} value={s}>
                  {NOTIFICATION_STATE_WORDS[s]}
                </option>
              ))}
            </TextField>
            {state !== 'to-notify' && (
              <>
                <TextField label="Scheme reference" {...register('schemeRef')} error={!!e.schemeRef} helperText={e.schemeRef?.message ?? 'As the competent person scheme gave it.'} />
                <Controller control={control} name="notifiedOn" render={({ field }) => <DateInput label="Notified on" {...field} max={today} error={!!e.notifiedOn} helperText={e.notifiedOn?.message ?? ' '} />} />
              </>
            )}
            {state === 'certificate-received' && (
              <Controller
                control={control}
                name="certificateReceivedOn"
                render={({ field }) => (
                  <DateInput
                    label="Certificate received on"
                    {...field}
                    max={today}
                    error={!!e.certificateReceivedOn}
                    helperText={e.certificateReceivedOn?.message ?? 'The Building Regulations compliance certificate the customer receives.'}
                  />
                )}
              />
            )}
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" disabled={record.isPending}>
            Save
          </Button>
        </DialogActions>
      </Stack>
    </Dialog>
  );
}
