import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useEffect } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { type BillingTerms, useBillingTerms } from '../api/get-billing-terms';
import { useUpdateBillingTerms } from '../api/update-billing-terms';

const days = (label: string, min: number, max: number) =>
  z
    .string()
    .trim()
    .regex(/^\d{1,3}$/, `${label}: a whole number of days.`)
    .refine((v) => Number(v) >= min && Number(v) <= max, `${label}: from ${min} to ${max} days.`);

export const termsSchema = z.object({
  vatNumber: z
    .string()
    .trim()
    .refine((v) => v === '' || /^[A-Z]{0,2} ?[0-9][0-9 ]{4,16}$/i.test(v), 'VAT number: a VAT registration number such as GB 123 4567 89, or empty if not registered.'),
  paymentTermsDays: days('Days to pay', 0, 365),
  quoteValidDays: days('Quotes stand for', 1, 365),
  paymentTerms: z.string().max(1000, 'Terms: at most 1000 characters.'),
  paymentInstructions: z.string().max(1000, 'How to pay: at most 1000 characters.'),
});
type Values = z.infer<typeof termsSchema>;

const valuesOf = (t: BillingTerms): Values => ({
  vatNumber: t.vatNumber ?? '',
  paymentTermsDays: String(t.paymentTermsDays),
  quoteValidDays: String(t.quoteValidDays),
  paymentTerms: t.paymentTerms ?? '',
  paymentInstructions: t.paymentInstructions ?? '',
});

/** What every new quote and invoice starts with; what was issued keeps what it was issued with. */
export function BillingTermsForm() {
  const terms = useBillingTerms();
  const update = useUpdateBillingTerms();
  const { register, handleSubmit, formState, reset } = useForm<Values>({ resolver: zodResolver(termsSchema) });
  useEffect(() => {
    if (terms.data) reset(valuesOf(terms.data));
  }, [terms.data, reset]);
  if (terms.isPending) return <LinearProgress aria-label="Loading the terms" />;
  if (terms.isError) return <Alert severity="error">{terms.error.message}</Alert>;
  const e = formState.errors;
  const submit = handleSubmit((v) =>
    update.mutate({
      vatNumber: v.vatNumber || null,
      paymentTermsDays: Number(v.paymentTermsDays),
      quoteValidDays: Number(v.quoteValidDays),
      paymentTerms: v.paymentTerms,
      paymentInstructions: v.paymentInstructions,
    }),
  );
  return (
    <Paper variant="outlined" sx={{ p: 3, maxWidth: 880 }}>
      <Stack component="form" aria-label="Terms for quotes and invoices" noValidate spacing={2.5} onSubmit={submit}>
        <Typography color="text.secondary">What every new quote and invoice starts with. What was issued keeps what it was issued with.</Typography>
        {update.isError && <Alert severity="error">{update.error.message}</Alert>}
        {update.isSuccess && !formState.isDirty && <Alert severity="success">Saved. New quotes and invoices take these terms.</Alert>}
        <Stack direction="row" spacing={2}>
          <TextField
            label="VAT number"
            {...register('vatNumber')}
            error={!!e.vatNumber}
            helperText={e.vatNumber?.message ?? 'Printed on every invoice. Empty if you are not registered for VAT: invoices then charge none.'}
          />
          <TextField label="Days to pay" inputMode="numeric" {...register('paymentTermsDays')} error={!!e.paymentTermsDays} helperText={e.paymentTermsDays?.message ?? '0 for payment on receipt'} sx={{ maxWidth: 200 }} />
          <TextField label="Quotes stand for" inputMode="numeric" {...register('quoteValidDays')} error={!!e.quoteValidDays} helperText={e.quoteValidDays?.message ?? 'days'} sx={{ maxWidth: 200 }} />
        </Stack>
        <TextField label="Terms" multiline minRows={3} {...register('paymentTerms')} error={!!e.paymentTerms} helperText={e.paymentTerms?.message ?? 'Printed under every quote and invoice.'} />
        <TextField
          label="How to pay"
          multiline
          minRows={2}
          {...register('paymentInstructions')}
          error={!!e.paymentInstructions}
          helperText={e.paymentInstructions?.message ?? 'Bank account, who cheques are payable to. Card payments are offered on the customer’s link.'}
        />
        <div>
          <Button type="submit" variant="contained" disabled={update.isPending || !formState.isDirty}>
            Save terms
          </Button>
        </div>
      </Stack>
    </Paper>
  );
}
