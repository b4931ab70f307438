import { zodResolver } from '@hookform/resolvers/zod';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { BONDING_STATES, EARTHING_CONDUCTOR_STATES, type FieldValue } from '@wiretrail/core';
import { useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { DraftNotice } from '@/components/forms/draft-notice';
import { startingValues, useFormDraft } from '@/components/forms/form-draft';
import { choicesOf, NativeChoice, SaveBar } from '@/components/forms/phone-inputs';
import type { BoardRow, SiteRow } from '@/lib/db';
import { readingField, readingText, usableReading } from '@/lib/readings';
import { saveRecord } from '@/lib/sync/local-write';

const CONDUCTOR_WORDS: Record<string, string> = { adequate: 'Present and adequate', inadequate: 'Present, not adequate', absent: 'Not present' };
const BONDING_WORDS: Record<string, string> = { ...CONDUCTOR_WORDS, none: 'No such service' };

export const BONDED_SERVICES = [
  ['bondingWater', 'Main bonding to water'],
  ['bondingGas', 'Main bonding to gas'],
  ['bondingOil', 'Main bonding to oil'],
  ['bondingSteel', 'Main bonding to structural steel'],
  ['bondingOther', 'Main bonding to other parts'],
] as const;
type BondingField = (typeof BONDED_SERVICES)[number][0];

const state = <V extends readonly string[]>(values: V) => z.enum(['', ...values]);

export const installationSchema = z.object({
  earthingConductor: state(EARTHING_CONDUCTOR_STATES),
  bondingWater: state(BONDING_STATES),
  bondingGas: state(BONDING_STATES),
  bondingOil: state(BONDING_STATES),
  bondingSteel: state(BONDING_STATES),
  bondingOther: state(BONDING_STATES),
  bondingOtherWhat: z.string().max(100, 'What the other bonding goes to must be at most 100 characters.'),
  zdb: z.record(z.string(), readingField('board', 'zdbOhm', 'Zdb', 'Ω')),
});
type InstallationValues = z.infer<typeof installationSchema>;

function defaults(site: SiteRow | undefined, boards: BoardRow[]): InstallationValues {
  return {
    earthingConductor: site?.earthingConductor ?? '',
    bondingWater: site?.bondingWater ?? '',
    bondingGas: site?.bondingGas ?? '',
    bondingOil: site?.bondingOil ?? '',
    bondingSteel: site?.bondingSteel ?? '',
    bondingOther: site?.bondingOther ?? '',
    bondingOtherWhat: site?.bondingOtherWhat ?? '',
    zdb: Object.fromEntries(boards.map((b) => [b.id, readingText(b.zdbOhm)])),
  };
}

/**
 * The installation's earthing and main bonding, and Zdb at the board, as the certificate states them. They belong to
 * the site and its boards, so what was recorded on an earlier visit is carried here and only needs confirming.
 */
export function InstallationChecks({ site, boards, locked }: { site: SiteRow | undefined; boards: BoardRow[]; locked: boolean }) {
  const draftKey = locked || !site ? null : `installation.${site.id}`;
  const recorded = defaults(site, boards);
  const { register, control, handleSubmit, formState, reset } = useForm<InstallationValues>({ resolver: zodResolver(installationSchema), defaultValues: startingValues(draftKey, recorded) });
  const draft = useFormDraft(draftKey, useWatch({ control }) as InstallationValues, recorded, reset);
  const [error, setError] = useState<string | null>(null);
  const [note, setNote] = useState('');
  const errors = formState.errors;
  if (!site) return null;

  async function save(v: InstallationValues) {
    setError(null);
    setNote('');
    const siteFields: Record<string, FieldValue> = {
      earthingConductor: v.earthingConductor || null,
      bondingOtherWhat: v.bondingOtherWhat.trim() || null,
      ...Object.fromEntries(BONDED_SERVICES.map(([field]) => [field, v[field] || null])),
    };
    try {
      await saveRecord('site', site!.id, siteFields);
      for (const b of boards) {
        const zdb = usableReading(v.zdb[b.id]);
        if (zdb !== (b.zdbOhm ?? null)) await saveRecord('board', b.id, { zdbOhm: zdb });
      }
      draft.settle();
      setNote('Earthing, bonding and Zdb saved on this phone.');
    } catch (err) {
      setError((err as Error).message);
    }
  }

  const choice = (field: 'earthingConductor' | BondingField, label: string, words: Record<string, string>, values: readonly string[]) => (
    <Controller key={field} control={control} name={field} render={({ field: f }) => <NativeChoice label={label} {...f} emptyLabel="Not checked" options={choicesOf(values, words)} />} />
  );

  return (
    <Paper variant="outlined" sx={{ p: 2 }} component="form" aria-label="Earthing and bonding" noValidate onSubmit={handleSubmit(save)}>
      <fieldset disabled={locked} style={{ border: 0, padding: 0, margin: 0, minWidth: 0 }}>
        <Stack spacing={1.5}>
          <Typography variant="h3">Earthing and bonding</Typography>
          <DraftNotice draft={draft} disabled={locked} />
          <Typography variant="body2" color="text.secondary">
            As found at the installation, for the certificate. Carried from the last visit to this site: check them again.
          </Typography>
          {boards.map((b) => (
            // Controlled, so the label moves out of the way of a figure carried from the last visit.
            <Controller
              key={b.id}
              control={control}
              name={`zdb.${b.id}`}
              render={({ field }) => (
                <TextField
                  label={`Zdb at ${b.name} (Ω)`}
                  {...field}
                  value={field.value ?? ''}
                  error={!!errors.zdb?.[b.id]}
                  helperText={errors.zdb?.[b.id]?.message ?? 'Earth fault loop impedance measured at the board.'}
                  slotProps={{ htmlInput: { inputMode: 'decimal', autoComplete: 'off' } }}
                />
              )}
            />
          ))}
          {choice('earthingConductor', 'Earthing conductor', CONDUCTOR_WORDS, EARTHING_CONDUCTOR_STATES)}
          {BONDED_SERVICES.map(([field, label]) => choice(field, label, BONDING_WORDS, BONDING_STATES))}
          <TextField label="Other parts bonded" placeholder="Lightning protection" {...register('bondingOtherWhat')} error={!!errors.bondingOtherWhat} helperText={errors.bondingOtherWhat?.message ?? ' '} />
          <SaveBar error={error} locked={locked} label="Save earthing and bonding" />
          {note && (
            <Typography variant="body2" role="status">
              {note}
            </Typography>
          )}
        </Stack>
      </fieldset>
    </Paper>
  );
}
