import { documentTotals, formatMoney, formatRate, INVOICE_NAMES, type InvoiceKind } from '@wiretrail/core';
import type { JobFile } from '../../paperwork/job-file.js';
import { INK } from '../../paperwork/pdf/document-layout.js';
import { dateWords } from '../../paperwork/pdf/document-words.js';
import { type Issue, issuedBy, startJobDocument } from '../../paperwork/pdf/job-heading.js';
import type { Invoice } from '../entities/invoice.entity.js';
import type { InvoiceLine } from '../entities/invoice-line.entity.js';


export interface InvoicePdf {
  issue: Issue;
  file: JobFile;
  /** As it is being issued: number, dates, terms and totals already set. */
  invoice: Invoice;
  lines: InvoiceLine[];
  /** A credit note's invoice. */
  credits: Invoice | null;
  /** Whether the customer's link offers to pay by card. */
  cardPayments: boolean;
}

const SUBTITLES: Record<InvoiceKind, string> = {
  quote: 'What the work below will cost, if you would like us to go ahead',
  invoice: 'For the work below; please pay by the date shown',
  'credit-note': 'Takes back what is listed below from the invoice named',
};

const day = (date: string | null, file: JobFile) => (date ? dateWords(`${date}T12:00:00Z`, file.organisation.timeZone) : '');

/**
 * A quote, invoice or credit note in Wiretrail's document layout: who and where, the dates, every line with its
 * VAT rate, the totals per rate, and how to pay. What a full VAT invoice shows follows the VAT Regulations 1995,
 * regulation 14(1) (as summarised in HMRC's manual VATREC5010): number, dates, supplier with VAT number, customer,
 * each line's quantity, rate and net amount, the totals and the VAT in sterling.
 */
export async function invoicePdf({ issue, file, invoice, lines, credits, cardPayments }: InvoicePdf): Promise<Buffer> {
  const kind = invoice.kind;
  const registered = !!invoice.vatNumber;
  const layout = await startJobDocument({
    title: INVOICE_NAMES[kind],
    subtitle: kind === 'credit-note' && credits ? `Takes back what is listed below from invoice ${credits.number ?? ''}` : SUBTITLES[kind],
    issue,
    file,
    contractor: [['VAT registration number', invoice.vatNumber ?? 'Not registered for VAT']],
  });
  const { doc } = layout;

  layout.heading(kind === 'quote' ? 'The quote' : kind === 'invoice' ? 'The invoice' : 'The credit note');
  const dates: Array<[string, string]> = [[registered && kind !== 'quote' ? 'Date of issue and tax point' : 'Date of issue', day(invoice.issueDate, file)]];
  if (kind === 'invoice') dates.push(['Payment due by', `${day(invoice.dueDate, file)} (${invoice.termDays === 0 ? 'on receipt' : `${invoice.termDays} days`})`], ['Amount due', formatMoney(invoice.grossMinor)]);
  if (kind === 'quote') dates.push(['Stands until', day(invoice.dueDate, file)], ['Total', formatMoney(invoice.grossMinor)]);
  if (kind === 'credit-note') dates.push(['Invoice credited', credits ? `${credits.number ?? ''}, issued ${day(credits.issueDate, file)}` : ''], ['Amount credited', formatMoney(-invoice.grossMinor)]);
  layout.fields(dates, 3);

  layout.heading(kind === 'credit-note' ? 'What is credited' : 'Work and materials');
  layout.table(
    [
      { header: 'Description', width: 3.6 },
      { header: 'Quantity', width: 1, align: 'right' },
      { header: 'Unit price', width: 0.95, align: 'right' },
      ...(registered ? [{ header: 'VAT rate', width: 0.7, align: 'right' as const }] : []),
      { header: registered ? 'Net' : 'Amount', width: 0.95, align: 'right' },
      ...(registered ? [{ header: 'VAT', width: 0.8, align: 'right' as const }] : []),
    ],
    lines.map((l) => ({
      cells: [
        l.description,
        `${l.quantity}${l.unit ? ` ${l.unit}` : ''}`,
        formatMoney(l.unitPriceMinor),
        ...(registered ? [formatRate(l.vatBasisPoints)] : []),
        formatMoney(l.netMinor),
        ...(registered ? [formatMoney(l.vatMinor)] : []),
      ],
    })),
  );

  // The totals, right-aligned under the table: per rate, then in all.
  const totals = documentTotals(lines.map((l) => ({ quantity: l.quantity, unitPriceMinor: l.unitPriceMinor, vatBasisPoints: l.vatBasisPoints })));
  const total: [string, string, boolean] = [kind === 'credit-note' ? 'Total credited' : 'Total', formatMoney(totals.grossMinor), true];
  // With one rate its VAT is the VAT; with several, each rate's net and VAT come first.
  const rows: Array<[string, string, boolean]> = !registered
    ? [total]
    : totals.byRate.length === 1
      ? [['Total before VAT', formatMoney(totals.netMinor), false], [`VAT at ${formatRate(totals.byRate[0]!.basisPoints)}`, formatMoney(totals.vatMinor), false], total]
      : [
          ...totals.byRate.flatMap((r): Array<[string, string, boolean]> => [
            [`Net at ${formatRate(r.basisPoints)}`, formatMoney(r.netMinor), false],
            [`VAT at ${formatRate(r.basisPoints)}`, formatMoney(r.vatMinor), false],
          ]),
          ['Total before VAT', formatMoney(totals.netMinor), false],
          ['VAT', formatMoney(totals.vatMinor), false],
          total,
        ];
  layout.ensure(rows.length * 15 + 20);
  const labelX = layout.left + layout.width * 0.5;
  const labelW = layout.width * 0.3;
  const valueX = labelX + labelW;
  const valueW = layout.width - labelW - layout.width * 0.5;
  for (const [label, value, strong] of rows) {
    const y = layout.y;
    if (strong) {
      doc.rect(labelX - 6, y - 3, labelW + valueW + 6, 18).fill(INK.copperTint);
      doc.rect(labelX - 6, y - 3, 3, 18).fill(INK.copper);
    }
    layout.font(strong ? 'bold' : 'regular', strong ? 10.5 : 9, strong ? INK.text : INK.muted);
    doc.text(label, labelX, y, { width: labelW, lineBreak: false });
    layout.font(strong ? 'bold' : 'regular', strong ? 10.5 : 9, INK.text);
    doc.text(value, valueX, y, { width: valueW - 4, align: 'right', lineBreak: false });
    layout.y = y + (strong ? 19 : 14);
  }
  doc.x = layout.left;
  if (!registered) layout.paragraph(`${file.organisation.name} is not registered for VAT, so no VAT is charged.`, 'regular', INK.muted, 8);
  if (kind === 'credit-note' && credits) {
    layout.paragraph(`This credit note takes ${formatMoney(-invoice.grossMinor)} off what is owed on invoice ${credits.number ?? ''}.`, 'medium');
  }

  if (invoice.notes) {
    layout.heading('Notes');
    layout.paragraph(invoice.notes);
  }
  if (kind === 'invoice') {
    layout.heading('How to pay');
    const ways = [
      invoice.paymentInstructions,
      cardPayments ? 'Or pay by card from the link in the e-mail that came with this invoice.' : null,
      `Please give ${invoice.number ?? 'the invoice number'} as the reference.`,
    ].filter((w): w is string => !!w);
    for (const w of ways) layout.paragraph(w);
  }
  // Terms of payment mean nothing on a credit note.
  if (invoice.terms && kind !== 'credit-note') {
    layout.heading('Terms');
    layout.paragraph(invoice.terms, 'regular', INK.text, 8.5);
  }
  issuedBy(layout, issue, file);
  return layout.finish();
}
