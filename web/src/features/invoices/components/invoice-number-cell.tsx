import Box from '@mui/material/Box';
import TableCell from '@mui/material/TableCell';
import Typography from '@mui/material/Typography';
import { INVOICE_NAMES } from '@wiretrail/core';
import type { InvoiceKind } from '../api/get-invoice';

/** An invoice's number (or "Draft") over its kind, and the invoice a credit note corrects when there is one. */
export function InvoiceNumberCell({ number, kind, creditsNumber }: { number: string | null; kind: InvoiceKind; creditsNumber?: string | null }) {
  return (
    <TableCell>
      <Box sx={{ fontWeight: 500, whiteSpace: 'nowrap' }}>{number ?? 'Draft'}</Box>
      <Typography variant="body2" color="text.secondary">
        {INVOICE_NAMES[kind]}
        {creditsNumber ? ` for ${creditsNumber}` : ''}
      </Typography>
    </TableCell>
  );
}
