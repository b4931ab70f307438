import Typography from '@mui/material/Typography';
import { isVoided, voidWords } from '@wiretrail/core';

/** How a voided record reads in a list: struck through, kept legible for the office. */
export const VOIDED_SX = { textDecoration: 'line-through', color: 'text.secondary' } as const;

/** The struck-through look for a row's text when the row is voided, else nothing. */
export function voidedSx(row: { readonly voidedAt?: unknown }): typeof VOIDED_SX | undefined {
  return isVoided(row) ? VOIDED_SX : undefined;
}

/** "Void: typed the wrong label" under a voided record; nothing for one that counts. */
export function VoidedMark({ row }: { row: { readonly voidedAt?: unknown; readonly voidReason?: unknown } }) {
  if (!isVoided(row)) return null;
  return (
    <Typography variant="body2" color="error" sx={{ fontWeight: 500, overflowWrap: 'anywhere' }}>
      {voidWords(row)}
    </Typography>
  );
}
