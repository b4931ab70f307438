import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { DEFAULT_RULE_SET, EXISTING_INSTALLATION_REG, FINISHED_VISIT_STATUS, minorWorksDeclaration, PERMITTED_EXCEPTIONS_REG } from '@wiretrail/core';
import { useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import type { VisitRow } from '@/lib/db';
import { saveRecord } from '@/lib/sync/local-write';
import { SignatureBox } from './signature-pad';

const text = (max: number, what: string) => z.string().max(max, `${what} must be at most ${max.toLocaleString('en-GB')} characters.`);

const CLOCK = /^([01]\d|2[0-3]):[0-5]\d$/;

export const signOffSchema = z.object({
  arrivedAt: z.string().regex(CLOCK, 'Give the time you arrived, like 09:05.'),
  leftAt: z.string().regex(CLOCK, 'Give the time you are leaving, like 12:30.'),
  workDescription: text(20_000, 'The description of the work').refine((s) => s.trim().length > 0, 'Describe the work done and its extent.'),
  observations: text(20_000, 'The observations'),
  departures: text(20_000, 'The departures'),
  existingInstallationComments: text(20_000, 'The comments on the existing installation'),
  permittedExceptions: text(20_000, 'The permitted exceptions'),
  riskAssessmentRef: text(200, 'The risk assessment reference'),
  signedByPosition: text(100, 'The position'),
  signedByName: z.string().trim().min(1, 'Give the name of the person signing.').max(200, 'The name must be at most 200 characters.'),
  signatureSvg: z.string().nullable().refine((s) => !!s, 'Sign in the box to finish the visit.').refine((s) => !s || s.length <= 60_000, 'The signature is too long; clear it and sign again.'),
})
  .refine((v) => !CLOCK.test(v.arrivedAt) || !CLOCK.test(v.leftAt) || v.leftAt >= v.arrivedAt, { path: ['leftAt'], message: 'The time you left must be after the time you arrived.' })
  // The standard asks for the risk assessment behind an exception to be attached: name it.
  .refine((v) => !v.permittedExceptions.trim() || !!v.riskAssessmentRef.trim(), { path: ['riskAssessmentRef'], message: 'Name the risk assessment behind the exception.' });
export type SignOffValues = z.infer<typeof signOffSchema>;

const clock = (d: Date) => `${String(d.getHours()).padStart(2, '0')}:${String(d.getMinutes()).padStart(2, '0')}`;

/** The time of day on the visit's own day: time on site is billed from these. */
export function onDay(dayIso: string, hhmm: string): string {
  const d = new Date(dayIso);
  const [h, m] = hhmm.split(':').map(Number);
  d.setHours(h!, m!, 0, 0);
  return d.toISOString();
}

interface Props {
  visit: VisitRow;
  defaultDescription: string;
  signerName: string;
  /** The position the signer gave last time, offered again. */
  signerPosition?: string;
  problemCount: number;
}

/** What the signer declares, as the certificate prints it above the signature. */
export const DECLARATION = minorWorksDeclaration(DEFAULT_RULE_SET.edition);

/** What was done, what was seen and where it departs from the standard, signed; finishing locks the visit's records. */
export function SignOffForm({ visit, defaultDescription, signerName, signerPosition = '', problemCount }: Props) {
  const { register, control, handleSubmit, formState, getValues } = useForm<SignOffValues>({
    resolver: zodResolver(signOffSchema),
    defaultValues: {
      arrivedAt: clock(new Date(visit.actualStart ?? visit.plannedStart ?? Date.now())),
      leftAt: clock(new Date()),
      workDescription: visit.workDescription ?? defaultDescription,
      observations: visit.observations ?? '',
      departures: visit.departures ?? '',
      existingInstallationComments: visit.existingInstallationComments ?? '',
      permittedExceptions: visit.permittedExceptions ?? '',
      riskAssessmentRef: visit.riskAssessmentRef ?? '',
      signedByPosition: visit.signedByPosition ?? signerPosition,
      signedByName: visit.signedByName ?? signerName,
      signatureSvg: null,
    },
  });
  const [confirming, setConfirming] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const errors = formState.errors;
  const [departures, permittedExceptions] = useWatch({ control, name: ['departures', 'permittedExceptions'] });
  // A fail or a gap with no departure written cannot go on a certificate: say so at the field.
  const departureWanted = problemCount > 0 && !departures?.trim();

  async function finish(v: SignOffValues) {
    setConfirming(false);
    setError(null);
    const now = new Date().toISOString();
    const day = visit.actualStart ?? visit.plannedStart ?? now;
    try {
      await saveRecord('visit', visit.id, {
        status: FINISHED_VISIT_STATUS,
        actualStart: onDay(day, v.arrivedAt),
        actualEnd: onDay(day, v.leftAt),
        signedAt: now,
        signedByName: v.signedByName.trim(),
        signatureSvg: v.signatureSvg,
        workDescription: v.workDescription.trim(),
        observations: v.observations.trim() || null,
        departures: v.departures.trim() || null,
        existingInstallationComments: v.existingInstallationComments.trim() || null,
        permittedExceptions: v.permittedExceptions.trim() || null,
        riskAssessmentRef: v.permittedExceptions.trim() ? v.riskAssessmentRef.trim() || null : null,
        signedByPosition: v.signedByPosition.trim() || null,
      });
    } catch (err) {
      setError((err as Error).message);
    }
  }

  // Problems with no departure written: finishing is allowed, but only after saying so plainly.
  const submit = handleSubmit((v) => (problemCount > 0 && !v.departures.trim() ? setConfirming(true) : finish(v)));

  return (
    <Box component="form" aria-label="Sign off" noValidate onSubmit={submit}>
      <Stack spacing={2}>
        <Stack direction="row" spacing={1.5}>
          <TextField label="Arrived" type="time" {...register('arrivedAt')} error={!!errors.arrivedAt} helperText={errors.arrivedAt?.message ?? 'Time on site starts here.'} slotProps={{ inputLabel: { shrink: true } }} />
          <TextField label="Left" type="time" {...register('leftAt')} error={!!errors.leftAt} helperText={errors.leftAt?.message ?? ' '} slotProps={{ inputLabel: { shrink: true } }} />
        </Stack>
        <TextField label="Work done and its extent" multiline minRows={3} {...register('workDescription')} error={!!errors.workDescription} helperText={errors.workDescription?.message ?? 'As it should read on the certificate.'} />
        <TextField label="Observations" multiline minRows={2} {...register('observations')} error={!!errors.observations} helperText={errors.observations?.message ?? 'What you saw that the customer or the office should know.'} />
        <TextField
          label="Departures"
          multiline
          minRows={2}
          {...register('departures')}
          error={!!errors.departures}
          color={departureWanted ? 'warning' : undefined}
          focused={departureWanted ? true : undefined}
          helperText={
            errors.departures?.message ??
            (departureWanted
              ? `${problemCount === 1 ? 'One problem is' : `${problemCount} problems are`} listed above: write where the work departs from the standard and why, or put it right first.`
              : 'Where the work departs from the standard, and why. Needed for any fail or missing reading.')
          }
        />
        <TextField
          label={`Comments on the existing installation (${EXISTING_INSTALLATION_REG})`}
          multiline
          minRows={2}
          {...register('existingInstallationComments')}
          error={!!errors.existingInstallationComments}
          helperText={errors.existingInstallationComments?.message ?? 'Defects seen in the installation the work connects to, including its earthing and bonding.'}
        />
        <TextField
          label={`Permitted exceptions (${PERMITTED_EXCEPTIONS_REG})`}
          multiline
          minRows={1}
          {...register('permittedExceptions')}
          error={!!errors.permittedExceptions}
          helperText={errors.permittedExceptions?.message ?? 'Where the regulations allow a part without fault protection. Blank if none.'}
        />
        {permittedExceptions?.trim() && (
          <TextField label="Risk assessment reference" {...register('riskAssessmentRef')} error={!!errors.riskAssessmentRef} helperText={errors.riskAssessmentRef?.message ?? 'The risk assessment kept with the certificate.'} />
        )}
        <Stack direction="row" spacing={1.5}>
          <TextField label="Signed by" {...register('signedByName')} error={!!errors.signedByName} helperText={errors.signedByName?.message ?? ' '} autoComplete="name" sx={{ flex: 1 }} />
          <TextField label="Position" placeholder="Electrician" {...register('signedByPosition')} error={!!errors.signedByPosition} helperText={errors.signedByPosition?.message ?? 'As the certificate names it.'} autoComplete="organization-title" sx={{ flex: 1 }} />
        </Stack>
        <Typography variant="body2" component="p" role="note" aria-label="Declaration">
          <strong>Declaration on the certificate.</strong> {DECLARATION}
        </Typography>
        <Controller control={control} name="signatureSvg" render={({ field }) => <SignatureBox onChange={field.onChange} error={errors.signatureSvg?.message} />} />
        {error && (
          <Alert severity="error" role="alert">
            {error}
          </Alert>
        )}
        <Button type="submit" variant="contained" color="secondary" size="large" sx={{ minHeight: 60, fontSize: '1.1rem' }}>
          Finish visit
        </Button>
        <Typography variant="body2" color="text.secondary">
          Finishing locks this visit’s readings, cables and point changes on every phone. A change after that goes to the office for review.
        </Typography>
      </Stack>
      <Dialog open={confirming} onClose={() => setConfirming(false)} aria-labelledby="confirm-finish-title">
        <DialogTitle id="confirm-finish-title">Finish with {problemCount === 1 ? 'a problem' : `${problemCount} problems`} listed?</DialogTitle>
        <DialogContent>
          <Typography>
            The list above shows fails or missing readings, and no departure is written. The office cannot issue a certificate for them until they are put right or
            recorded as departures.
          </Typography>
        </DialogContent>
        <DialogActions>
          <Button onClick={() => setConfirming(false)} size="large">
            Go back
          </Button>
          <Button onClick={() => finish(getValues())} variant="contained" color="secondary" size="large">
            Finish anyway
          </Button>
        </DialogActions>
      </Dialog>
    </Box>
  );
}
