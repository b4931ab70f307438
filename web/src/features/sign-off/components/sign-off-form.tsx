import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import {
  DEFAULT_RULE_SET,
  type DepartureEntry,
  EXISTING_INSTALLATION_REG,
  FINISHED_VISIT_STATUS,
  minorWorksDeclaration,
  PERMITTED_EXCEPTIONS_REG,
  ruleSetInForce,
} from '@wiretrail/core';
import { useEffect, useRef, useState } from 'react';
import { Controller, useFieldArray, useForm, useWatch } from 'react-hook-form';
import type { PointGroup } from 'signature_pad';
import { z } from 'zod';
import { TimeInput } from '@/components/forms/date-inputs';
import type { VisitRow } from '@/lib/db';
import { saveRecord } from '@/lib/sync/local-write';
import { clearSignOffDraft, readSignOffDraft, writeSignOffDraft } from './sign-off-draft';
import { SignatureBox } from './signature-pad';

const text = (max: number, what: string) => z.string().max(max, `${what} must be at most ${max.toLocaleString('en-GB')} characters.`);

const CLOCK = /^([01]\d|2[0-3]):[0-5]\d$/;

/** The three parts of a departure, as the certificate prints them; a part left out makes it no departure at all. */
export const departureSchema = z
  .object({
    regulation: text(200, 'The regulation'),
    instead: text(2_000, 'What is done instead'),
    noLessSafe: text(2_000, 'Why it is no less safe'),
  })
  .superRefine((d, ctx) => {
    const parts = [d.regulation, d.instead, d.noLessSafe].map((p) => p.trim());
    if (parts.every((p) => !p)) return;
    if (!parts[0]) ctx.addIssue({ code: 'custom', path: ['regulation'], message: 'Name the regulation the work departs from.' });
    if (!parts[1]) ctx.addIssue({ code: 'custom', path: ['instead'], message: 'Say what is done instead.' });
    if (!parts[2]) ctx.addIssue({ code: 'custom', path: ['noLessSafe'], message: 'Say why this gives no less safety.' });
  });

const BLANK_DEPARTURE = { regulation: '', instead: '', noLessSafe: '' };

function storedDepartures(visit: VisitRow): { regulation: string; instead: string; noLessSafe: string }[] {
  const entries = Array.isArray(visit.departureEntries) ? (visit.departureEntries as readonly Partial<DepartureEntry>[]) : [];
  return entries.map((d) => ({ regulation: d.regulation ?? '', instead: d.instead ?? '', noLessSafe: d.noLessSafe ?? '' }));
}

export const signOffSchema = z.object({
  arrivedAt: z.string().regex(CLOCK, 'Give the time you arrived, like 09:05.'),
  // Blank until typed: the time of finishing is taken when the visit is signed off, not when the form opened.
  leftAt: z.string().refine((s) => s === '' || CLOCK.test(s), 'Give the time you left, like 12:30, or leave it blank for the time you finish.'),
  workDescription: text(20_000, 'The description of the work').refine((s) => s.trim().length > 0, 'Describe the work done and its extent.'),
  observations: text(20_000, 'The observations'),
  departureEntries: z.array(departureSchema),
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

/** Entries left wholly blank are dropped; the rest are stored trimmed, or nothing when none is left. */
function departuresToKeep(entries: SignOffValues['departureEntries']): DepartureEntry[] | null {
  const kept = entries
    .map((d) => ({ regulation: d.regulation.trim(), instead: d.instead.trim(), noLessSafe: d.noLessSafe.trim() }))
    .filter((d) => d.regulation || d.instead || d.noLessSafe);
  return kept.length ? kept : null;
}

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

/**
 * What the signer declares, as the certificate prints it above the signature: the amendment in force on the day the
 * work is completed, which is the day it is signed.
 */
export function declarationOn(day: Date): string {
  const rules = ruleSetInForce(day) ?? DEFAULT_RULE_SET;
  return minorWorksDeclaration(rules.edition, day.toLocaleDateString('en-GB', { day: 'numeric', month: 'long', year: 'numeric' }));
}

/**
 * What was done, what was seen and where the design departs from the standard, signed; finishing locks the visit's
 * records. What is typed is kept as a draft on this phone, so leaving the tab or reloading loses nothing.
 */
export function SignOffForm({ visit, defaultDescription, signerName, signerPosition = '', problemCount }: Props) {
  const draft = readSignOffDraft(visit.id);
  const { register, control, handleSubmit, formState, getValues, watch, setError: setFieldError } = useForm<SignOffValues>({
    resolver: zodResolver(signOffSchema),
    defaultValues: {
      arrivedAt: draft?.arrivedAt ?? clock(new Date(visit.actualStart ?? visit.plannedStart ?? Date.now())),
      leftAt: draft?.leftAt ?? '',
      workDescription: draft?.workDescription ?? visit.workDescription ?? defaultDescription,
      observations: draft?.observations ?? visit.observations ?? '',
      departureEntries: draft?.departureEntries ?? storedDepartures(visit),
      existingInstallationComments: draft?.existingInstallationComments ?? visit.existingInstallationComments ?? '',
      permittedExceptions: draft?.permittedExceptions ?? visit.permittedExceptions ?? '',
      riskAssessmentRef: draft?.riskAssessmentRef ?? visit.riskAssessmentRef ?? '',
      signedByPosition: draft?.signedByPosition ?? visit.signedByPosition ?? signerPosition,
      signedByName: draft?.signedByName ?? visit.signedByName ?? signerName,
      // Drawn again from its strokes below; with no strokes to draw there is no signature to keep.
      signatureSvg: draft?.signatureStrokes?.length ? (draft.signatureSvg ?? null) : null,
    },
  });
  const departures = useFieldArray({ control, name: 'departureEntries' });
  const [confirming, setConfirming] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const errors = formState.errors;
  const permittedExceptions = useWatch({ control, name: 'permittedExceptions' });
  const declaration = declarationOn(new Date());

  // The strokes behind the signature, kept beside the form so the box can draw them again after a reload.
  const strokes = useRef<PointGroup[] | undefined>(draft?.signatureStrokes);
  useEffect(() => {
    const subscription = watch((values) => writeSignOffDraft(visit.id, { ...(values as Partial<SignOffValues>), signatureStrokes: strokes.current }));
    return () => subscription.unsubscribe();
  }, [watch, visit.id]);

  async function finish(v: SignOffValues) {
    setConfirming(false);
    setError(null);
    const finishing = new Date();
    const now = finishing.toISOString();
    const day = visit.actualStart ?? visit.plannedStart ?? now;
    const leftAt = v.leftAt || clock(finishing);
    if (!v.leftAt && leftAt < v.arrivedAt) {
      setFieldError('leftAt', { message: `It is ${leftAt} now, before the ${v.arrivedAt} you arrived: correct the time you arrived.` });
      return;
    }
    try {
      await saveRecord('visit', visit.id, {
        status: FINISHED_VISIT_STATUS,
        actualStart: onDay(day, v.arrivedAt),
        actualEnd: onDay(day, leftAt),
        signedAt: now,
        signedByName: v.signedByName.trim(),
        signatureSvg: v.signatureSvg,
        workDescription: v.workDescription.trim(),
        observations: v.observations.trim() || null,
        departureEntries: departuresToKeep(v.departureEntries),
        existingInstallationComments: v.existingInstallationComments.trim() || null,
        permittedExceptions: v.permittedExceptions.trim() || null,
        riskAssessmentRef: v.permittedExceptions.trim() ? v.riskAssessmentRef.trim() || null : null,
        signedByPosition: v.signedByPosition.trim() || null,
      });
      clearSignOffDraft(visit.id);
    } catch (err) {
      setError((err as Error).message);
    }
  }

  // Finishing with problems listed is allowed (the job may need another visit), but only after saying so plainly.
  const submit = handleSubmit((v) => (problemCount > 0 ? setConfirming(true) : finish(v)));

  return (
    <Box component="form" aria-label="Sign off" noValidate onSubmit={submit}>
      <Stack spacing={2}>
        <Stack direction="row" spacing={1.5}>
          <Controller control={control} name="arrivedAt" render={({ field }) => <TimeInput label="Arrived" {...field} error={!!errors.arrivedAt} helperText={errors.arrivedAt?.message ?? 'Time on site starts here.'} />} />
          <Controller control={control} name="leftAt" render={({ field }) => <TimeInput label="Left" {...field} error={!!errors.leftAt} helperText={errors.leftAt?.message ?? 'Blank: the time you finish.'} />} />
        </Stack>
        <TextField label="Work done and its extent" multiline minRows={3} {...register('workDescription')} error={!!errors.workDescription} helperText={errors.workDescription?.message ?? 'As it should read on the certificate.'} />
        <TextField label="Observations" multiline minRows={2} {...register('observations')} error={!!errors.observations} helperText={errors.observations?.message ?? 'What you saw that the customer or the office should know.'} />
        <Paper variant="outlined" component="section" aria-label="Departures from the standard" sx={{ p: 1.5 }}>
          <Stack spacing={1.5}>
            <Typography sx={{ fontWeight: 500 }}>Departures from the standard</Typography>
            <Typography variant="body2" color="text.secondary">
              Only where the design deliberately departs from a regulation and gives no less safety (BS 7671 Regs 120.3, 133.1.3 and 133.5). A departure
              never stands in for a failed or missing test: put those right and test again.
            </Typography>
            {departures.fields.map((field, i) => {
              const e = errors.departureEntries?.[i];
              return (
                <Stack key={field.id} spacing={1} component="fieldset" aria-label={`Departure ${i + 1}`} sx={{ border: 0, p: 0, m: 0 }}>
                  <TextField label="Regulation departed from" {...register(`departureEntries.${i}.regulation`)} error={!!e?.regulation} helperText={e?.regulation?.message ?? 'For example 522.6.202.'} />
                  <TextField label="What is done instead" multiline minRows={2} {...register(`departureEntries.${i}.instead`)} error={!!e?.instead} helperText={e?.instead?.message ?? ' '} />
                  <TextField label="Why it gives no less safety" multiline minRows={2} {...register(`departureEntries.${i}.noLessSafe`)} error={!!e?.noLessSafe} helperText={e?.noLessSafe?.message ?? ' '} />
                  <Button onClick={() => departures.remove(i)} sx={{ alignSelf: 'flex-start' }}>
                    Remove departure {i + 1}
                  </Button>
                </Stack>
              );
            })}
            <Button variant="outlined" onClick={() => departures.append({ ...BLANK_DEPARTURE })} sx={{ alignSelf: 'flex-start', minHeight: 48 }}>
              Add a departure
            </Button>
          </Stack>
        </Paper>
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
          helperText={errors.permittedExceptions?.message ?? 'Where 30 mA RCD protection of a socket-outlet is left off on a documented risk assessment. Blank if none.'}
        />
        {permittedExceptions?.trim() && (
          <TextField label="Risk assessment reference" {...register('riskAssessmentRef')} error={!!errors.riskAssessmentRef} helperText={errors.riskAssessmentRef?.message ?? 'The risk assessment kept with the certificate.'} />
        )}
        <Stack direction="row" spacing={1.5}>
          <TextField label="Signed by" {...register('signedByName')} error={!!errors.signedByName} helperText={errors.signedByName?.message ?? ' '} autoComplete="name" sx={{ flex: 1 }} />
          <TextField label="Position" placeholder="Electrician" {...register('signedByPosition')} error={!!errors.signedByPosition} helperText={errors.signedByPosition?.message ?? 'As the certificate names it.'} autoComplete="organization-title" sx={{ flex: 1 }} />
        </Stack>
        <Typography variant="body2" component="p" role="note" aria-label="Declaration">
          <strong>Declaration on the certificate.</strong> {declaration}
        </Typography>
        <Controller
          control={control}
          name="signatureSvg"
          render={({ field }) => (
            <SignatureBox
              initialStrokes={strokes.current}
              onChange={(svg, drawn) => {
                strokes.current = drawn;
                field.onChange(svg);
              }}
              error={errors.signatureSvg?.message}
            />
          )}
        />

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
            The list above shows what a certificate cannot carry: fails, missing or unjudged readings, or work that needs another kind of certificate. The office
            cannot issue a minor works certificate until they are put right and the circuit is tested again; a departure does not change that.
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
