import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableRow from '@mui/material/TableRow';
import { formatMoney, formatRate } from '@wiretrail/core';

interface Props {
  byRate: ReadonlyArray<{ basisPoints: number; netMinor: number; vatMinor: number }>;
  netMinor: number;
  vatMinor: number;
  grossMinor: number;
  credit?: boolean;
}

/** Net and VAT per rate, then the totals: as the PDF prints them. */
export function TotalsTable({ byRate, netMinor, vatMinor, grossMinor, credit = false }: Props) {
  const rows: Array<[string, number]> =
    byRate.length > 1
      ? [...byRate.flatMap((r): Array<[string, number]> => [[`Net at ${formatRate(r.basisPoints)}`, r.netMinor], [`VAT at ${formatRate(r.basisPoints)}`, r.vatMinor]]), ['Total before VAT', netMinor], ['VAT', vatMinor]]
      : [['Total before VAT', netMinor], [byRate[0] ? `VAT at ${formatRate(byRate[0].basisPoints)}` : 'VAT', vatMinor]];
  return (
    <Table size="small" aria-label="Totals" sx={{ width: 340, '& td': { borderBottom: 0, py: 0.5 } }}>
      <TableBody>
        {rows.map(([label, minor]) => (
          <TableRow key={label}>
            <TableCell sx={{ color: 'text.secondary' }}>{label}</TableCell>
            <TableCell align="right" sx={{ fontVariantNumeric: 'tabular-nums' }}>
              {formatMoney(minor)}
            </TableCell>
          </TableRow>
        ))}
        <TableRow sx={{ bgcolor: 'action.hover' }}>
          <TableCell sx={{ fontWeight: 700 }}>{credit ? 'Total credited' : 'Total'}</TableCell>
          <TableCell align="right" sx={{ fontWeight: 700, fontVariantNumeric: 'tabular-nums' }}>
            {formatMoney(grossMinor)}
          </TableCell>
        </TableRow>
      </TableBody>
    </Table>
  );
}
