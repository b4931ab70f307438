import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { InvoiceSummary } from '../api/get-invoice';
import { standingOf } from '../invoice-words';

/** Paid, part paid, overdue, awaiting payment, draft: a chip, and the amount or days behind it. */
export function StandingChip({ invoice }: { invoice: InvoiceSummary }) {
  const s = standingOf(invoice);
  return (
    <Stack spacing={0.25} sx={{ alignItems: 'flex-start' }}>
      <Chip size="small" color={s.color} variant={s.color === 'default' || s.color === 'info' ? 'outlined' : 'filled'} label={s.label} />
      {s.detail && (
        <Typography variant="caption" color={s.color === 'error' ? 'error' : 'text.secondary'}>
          {s.detail}
        </Typography>
      )}
    </Stack>
  );
}

/** How its e-mail is getting on, as with documents: queued (or retrying, with why), sent, or given up. */
export function MailChip({ invoice }: { invoice: InvoiceSummary }) {
  if (!invoice.emailState) return <Typography variant="body2" color="text.secondary">Not e-mailed</Typography>;
  const label = invoice.emailState === 'sent' ? 'Sent' : invoice.emailState === 'failed' ? 'Failed' : invoice.emailError ? 'Retrying' : 'Queued';
  const color = invoice.emailState === 'sent' ? 'success' : invoice.emailState === 'failed' ? 'error' : 'info';
  return (
    <Stack spacing={0.25} sx={{ alignItems: 'flex-start' }} aria-label={`E-mail: ${label}`}>
      <Chip size="small" color={color} variant={color === 'info' ? 'outlined' : 'filled'} label={label} />
      <Typography variant="caption" color={invoice.emailState === 'failed' ? 'error' : 'text.secondary'} sx={{ maxWidth: 240, overflowWrap: 'anywhere' }}>
        {invoice.emailState === 'failed' ? invoice.emailError : `to ${invoice.emailedTo ?? ''}`}
      </Typography>
    </Stack>
  );
}
