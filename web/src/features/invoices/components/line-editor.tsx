import AddOutlined from '@mui/icons-material/AddOutlined';
import DeleteOutlined from '@mui/icons-material/DeleteOutlined';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import IconButton from '@mui/material/IconButton';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { zodResolver } from '@hookform/resolvers/zod';
import { documentTotals, formatMoney, formatRate, quantityThousandths } from '@wiretrail/core';
import { useEffect, useMemo } from 'react';
import { Controller, useFieldArray, useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { MONEY_TEXT, moneyText, penceOf } from '@/lib/money-text';
import { useVatRates } from '@/lib/vat-rates';
import type { InvoiceDetail, InvoiceKind, LineKind } from '../api/get-invoice';
import { type LineInput, useUpdateInvoice } from '../api/change-invoice';
import { usePriceChoices } from '../api/get-price-choices';
import { LINE_KIND_NAMES } from '../invoice-words';
import { TotalsTable } from './totals-table';

const QUANTITY = /^-?\d{1,9}(\.\d{1,3})?$/;
const KINDS = Object.keys(LINE_KIND_NAMES) as LineKind[];

/** The line editor's rules, with messages that name the field; a credit note's quantities are below nothing. */
export function lineEditorSchema(kind: InvoiceKind) {
  const credit = kind === 'credit-note';
  const line = z.object({
    kind: z.enum(['labour', 'material', 'fixed'], { message: 'Kind: choose labour, part or fixed price.' }),
    description: z.string().trim().min(1, 'Description: say what the line is for.').max(300, 'Description: at most 300 characters.'),
    quantity: z
      .string()
      .trim()
      .regex(QUANTITY, 'Quantity: a number with at most three decimal places, like 2.5.')
      .refine((v) => !QUANTITY.test(v) || quantityThousandths(v) !== 0n, 'Quantity: must not be nothing.')
      .refine(
        (v) => !QUANTITY.test(v) || quantityThousandths(v) === 0n || quantityThousandths(v) < 0n === credit,
        credit ? 'Quantity: on a credit note it is below nothing, as it takes back what was charged.' : 'Quantity: must be more than nothing.',
      ),
    unit: z.string().trim().max(20, 'Unit: at most 20 characters.'),
    unitPrice: z.string().trim().regex(MONEY_TEXT, 'Unit price: pounds and pence, like 12.50.'),
    vatRateCode: z.string().min(1, 'VAT rate: choose one.'),
    visitId: z.string().nullable(),
    priceItemId: z.string().nullable(),
    labourRateId: z.string().nullable(),
    // Where a part line came from, kept through edits so the part uses stay invoiced once.
    partUseIds: z.array(z.string()),
  });
  return z.object({
    lines: z.array(line).max(200, 'Lines: at most 200.'),
    notes: z.string().max(2000, 'Notes: at most 2000 characters.'),
    termDays: z
      .string()
      .trim()
      .regex(/^\d{1,3}$/, kind === 'quote' ? 'Stands for: a whole number of days.' : 'Days to pay: a whole number of days.')
      .refine((v) => Number(v) <= 365, kind === 'quote' ? 'Stands for: at most 365 days.' : 'Days to pay: at most 365 days.'),
  });
}
export type LineEditorValues = z.infer<ReturnType<typeof lineEditorSchema>>;
type LineValues = LineEditorValues['lines'][number];

const valuesOf = (invoice: InvoiceDetail): LineEditorValues => ({
  lines: invoice.lines.map((l) => ({
    kind: l.kind,
    description: l.description,
    quantity: l.quantity,
    unit: l.unit ?? '',
    unitPrice: moneyText(l.unitPriceMinor),
    vatRateCode: l.vatRateCode,
    visitId: l.visitId,
    priceItemId: l.priceItemId,
    labourRateId: l.labourRateId,
    partUseIds: l.partUseIds ?? [],
  })),
  notes: invoice.notes ?? '',
  termDays: String(invoice.termDays),
});

const bodyOf = (v: LineEditorValues): { lines: LineInput[]; notes: string | null; termDays: number } => ({
  lines: v.lines.map((l) => ({
    kind: l.kind,
    description: l.description.trim(),
    quantity: l.quantity.trim(),
    unit: l.unit.trim() || null,
    unitPriceMinor: penceOf(l.unitPrice),
    vatRateCode: l.vatRateCode,
    visitId: l.visitId,
    priceItemId: l.priceItemId,
    labourRateId: l.labourRateId,
    ...(l.partUseIds.length ? { partUseIds: l.partUseIds } : {}),
  })),
  notes: v.notes.trim() || null,
  termDays: Number(v.termDays),
});

const blank = (vatRateCode: string): LineValues => ({ kind: 'fixed', description: '', quantity: '1', unit: 'each', unitPrice: '', vatRateCode, visitId: null, priceItemId: null, labourRateId: null, partUseIds: [] });

/** A list to add a line from: picking one adds it and the list goes back to its prompt. */
function AddFromList({ label, prompt, width, options, onPick }: { label: string; prompt: string; width: number; options: Array<{ id: string; label: string }>; onPick: (id: string) => void }) {
  return (
    <TextField
      select
      size="small"
      label={label}
      value=""
      onChange={(ev) => ev.target.value && onPick(ev.target.value)}
      slotProps={{ select: { native: true }, inputLabel: { shrink: true } }}
      sx={{ width }}
    >
      <option value="">{prompt}</option>
      {options.map((o) => (
        <option key={o.id} value={o.id}>
          {o.label}
        </option>
      ))}
    </TextField>
  );
}

interface Props {
  invoice: InvoiceDetail;
  /** What could not be priced when the draft was built from the job. */
  warnings?: string[];
  /** What the build left out because a live invoice already asks for it, per visit. */
  leftOut?: string[];
  /** After a save; `thenIssue` when the office asked to issue it next. */
  onSaved?: (saved: InvoiceDetail, thenIssue: boolean) => void;
}

/**
 * A draft's lines: labour, parts and fixed-price items, each with its quantity, unit price before VAT and VAT rate,
 * and the totals per rate as they will be issued. Every refusal names the line's field.
 */
export function LineEditor({ invoice, warnings = [], leftOut = [], onSaved }: Props) {
  const credit = invoice.kind === 'credit-note';
  const update = useUpdateInvoice();
  const rates = useVatRates();
  const choices = usePriceChoices();
  const schema = useMemo(() => lineEditorSchema(invoice.kind), [invoice.kind]);
  const { register, control, handleSubmit, formState, reset } = useForm<LineEditorValues>({ resolver: zodResolver(schema), defaultValues: valuesOf(invoice) });
  const { fields, append, remove } = useFieldArray({ control, name: 'lines' });
  useEffect(() => reset(valuesOf(invoice)), [invoice, reset]);

  // A credit note credits at the rates its invoice charged; anything else is priced at the organisation's rates now.
  // The per cent comes first, so that it shows in a narrow field.
  const basisPoints = useMemo(() => {
    const m = new Map<string, number>();
    if (credit) for (const l of invoice.lines) m.set(l.vatRateCode, l.vatBasisPoints);
    else for (const r of rates.data?.items ?? []) m.set(r.code, r.basisPoints);
    return m;
  }, [credit, invoice.lines, rates.data]);
  const offered = credit
    ? [...basisPoints.entries()].map(([code, bp]) => ({ code, label: `${formatRate(bp)} ${code}` }))
    : (rates.data?.items ?? []).filter((r) => r.active || invoice.lines.some((l) => l.vatRateCode === r.code)).map((r) => ({ code: r.code, label: `${formatRate(r.basisPoints)} ${r.name.toLowerCase()}` }));
  const defaultVat = offered.find((o) => o.code === 'standard')?.code ?? offered[0]?.code ?? '';

  const watched = useWatch({ control, name: 'lines' });
  const priced = (watched ?? []).map((l) => {
    const ok = l && QUANTITY.test(l.quantity.trim()) && MONEY_TEXT.test(l.unitPrice.trim()) && basisPoints.has(l.vatRateCode);
    return ok ? { quantity: l.quantity.trim(), unitPriceMinor: penceOf(l.unitPrice), vatBasisPoints: basisPoints.get(l.vatRateCode)! } : null;
  });
  const totals = documentTotals(priced.filter((p): p is NonNullable<typeof p> => !!p));

  const save = (thenIssue: boolean) =>
    handleSubmit((v) => update.mutate({ id: invoice.id, ...bodyOf(v) }, { onSuccess: (saved) => onSaved?.(saved, thenIssue) }));
  const e = formState.errors;
  const lineErrors = e.lines && Array.isArray(e.lines) ? e.lines : [];

  return (
    <Stack component="form" aria-label={credit ? 'Lines credited' : 'Lines'} noValidate spacing={2} onSubmit={save(false)}>
      {warnings.length > 0 && (
        <Alert severity="warning">
          <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
            {warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </Box>
        </Alert>
      )}
      {leftOut.length > 0 && (
        <Alert severity="info" role="status" aria-label="Left out">
          <AlertTitle>Left out: already invoiced</AlertTitle>
          A visit’s time and parts are invoiced once. To charge them again, credit that invoice in full first.
          <Box component="ul" sx={{ m: 0, mt: 1, pl: 2.5 }}>
            {leftOut.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </Box>
        </Alert>
      )}
      {update.isError && <Alert severity="error">{update.error.message}</Alert>}
      {fields.length === 0 && <Typography color="text.secondary">No lines yet. Add labour, parts from the price list, or a fixed-price line.</Typography>}
      <Stack spacing={1.25}>
        {fields.map((f, i) => {
          const le = lineErrors[i];
          const net = priced[i] ? documentTotals([priced[i]!]).netMinor : null;
          const problems = le ? (['kind', 'description', 'quantity', 'unit', 'unitPrice', 'vatRateCode'] as const).map((k) => le[k]?.message).filter((m): m is string => !!m) : [];
          const errorsId = `line-${f.id}-problems`;
          // Each field's own mark; the sentences that name the fields sit under the whole line, where they have room.
          const mark = (k: keyof LineValues) => ({ error: !!le?.[k], slotProps: { htmlInput: { 'aria-describedby': le?.[k] ? errorsId : undefined }, inputLabel: { shrink: true } } });
          return (
            <Box
              key={f.id}
              role="group"
              aria-label={`Line ${i + 1}`}
              sx={{ display: 'grid', gap: 1, gridTemplateColumns: '128px minmax(220px, 1fr) 96px 84px 112px 192px 96px 48px', alignItems: 'start' }}
            >
              <TextField select size="small" label="Kind" {...register(`lines.${i}.kind`)} {...mark('kind')} slotProps={{ ...mark('kind').slotProps, select: { native: true } }}>
                {KINDS.map((k) => (
                  <option key={k} value={k}>
                    {LINE_KIND_NAMES[k]}
                  </option>
                ))}
              </TextField>
              <TextField size="small" label="Description" multiline maxRows={3} {...register(`lines.${i}.description`)} {...mark('description')} />
              <TextField size="small" label="Quantity" inputMode="decimal" {...register(`lines.${i}.quantity`)} {...mark('quantity')} />
              <TextField size="small" label="Unit" {...register(`lines.${i}.unit`)} {...mark('unit')} />
              <TextField size="small" label="Unit price (£)" inputMode="decimal" {...register(`lines.${i}.unitPrice`)} {...mark('unitPrice')} />
              <Controller
                control={control}
                name={`lines.${i}.vatRateCode`}
                render={({ field }) => (
                  // Controlled, so the rate shows once the organisation's rates have arrived.
                  <TextField select size="small" label="VAT rate" {...field} {...mark('vatRateCode')} slotProps={{ ...mark('vatRateCode').slotProps, select: { native: true } }}>
                    <option value="">Choose…</option>
                    {offered.map((o) => (
                      <option key={o.code} value={o.code}>
                        {o.label}
                      </option>
                    ))}
                  </TextField>
                )}
              />
              <Typography sx={{ pt: 1, textAlign: 'right', fontVariantNumeric: 'tabular-nums' }} aria-label={`Line ${i + 1} net`}>
                {net === null ? '—' : formatMoney(net)}
              </Typography>
              <IconButton aria-label={`Remove line ${i + 1}`} onClick={() => remove(i)} sx={{ minHeight: 40, minWidth: 40 }}>
                <DeleteOutlined />
              </IconButton>
              {problems.length > 0 && (
                <Typography id={errorsId} variant="body2" color="error" sx={{ gridColumn: '1 / -1', mt: -0.25 }}>
                  Line {i + 1}: {problems.join(' ')}
                </Typography>
              )}
            </Box>
          );
        })}
      </Stack>

      {!credit && (
        <Stack direction="row" spacing={1.5} sx={{ alignItems: 'flex-start', flexWrap: 'wrap', rowGap: 1.5 }}>
          <Button startIcon={<AddOutlined />} onClick={() => append(blank(defaultVat))}>
            Add a line
          </Button>
          <AddFromList
            label="Add a part from the price list"
            prompt="Choose a part…"
            width={320}
            options={choices.items.map((c) => ({ id: c.id, label: `${c.name} (${moneyText(c.sellMinor)} / ${c.unit})` }))}
            onPick={(id) => {
              const item = choices.items.find((c) => c.id === id)!;
              append({ kind: 'material', description: item.name, quantity: '1', unit: item.unit, unitPrice: moneyText(item.sellMinor ?? 0), vatRateCode: item.vatRateCode ?? defaultVat, visitId: null, priceItemId: item.id, labourRateId: null, partUseIds: [] });
            }}
          />
          <AddFromList
            label="Add labour at"
            prompt="Choose a rate…"
            width={260}
            options={choices.labour.map((c) => ({ id: c.id, label: `${c.name} (${moneyText(c.hourlyMinor)} / h)` }))}
            onPick={(id) => {
              const rate = choices.labour.find((c) => c.id === id)!;
              append({ kind: 'labour', description: `Labour (${rate.name})`, quantity: '1', unit: 'h', unitPrice: moneyText(rate.hourlyMinor), vatRateCode: rate.vatRateCode, visitId: null, priceItemId: null, labourRateId: rate.id, partUseIds: [] });
            }}
          />
        </Stack>
      )}

      <Stack direction="row" spacing={3} sx={{ alignItems: 'flex-start', justifyContent: 'space-between', flexWrap: 'wrap', rowGap: 2 }}>
        <Stack spacing={2} sx={{ flex: 1, minWidth: 320, maxWidth: 560 }}>
          {!credit && (
            <TextField
              size="small"
              label={invoice.kind === 'quote' ? 'Stands for (days)' : 'Days to pay'}
              inputMode="numeric"
              {...register('termDays')}
              error={!!e.termDays}
              helperText={e.termDays?.message}
              sx={{ maxWidth: 200 }}
            />
          )}
          <TextField size="small" label="Notes for the customer" multiline minRows={2} {...register('notes')} error={!!e.notes} helperText={e.notes?.message ?? 'Printed on the document.'} />
        </Stack>
        <TotalsTable byRate={totals.byRate} netMinor={totals.netMinor} vatMinor={totals.vatMinor} grossMinor={totals.grossMinor} credit={credit} />
      </Stack>

      <Stack direction="row" spacing={1.5} sx={{ justifyContent: 'flex-end' }}>
        <Button type="submit" disabled={update.isPending}>
          Save draft
        </Button>
        <Button variant="contained" disabled={update.isPending} onClick={save(true)}>
          Save and issue…
        </Button>
      </Stack>
    </Stack>
  );
}
