import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import { unvoided } from '@wiretrail/core';
import QRCode from 'qrcode';
import { useEffect, useState } from 'react';
import { paths } from '@/config/paths';
import type { CableRunRow } from '@/lib/db';
import { endWords } from './cable-list';

/** One QR code as inline SVG: made on the phone, so a label sheet prints with no signal. */
function Qr({ text, label }: { text: string; label: string }) {
  const [svg, setSvg] = useState<string | null>(null);
  useEffect(() => {
    let live = true;
    QRCode.toString(text, { type: 'svg', margin: 1, errorCorrectionLevel: 'M' }).then((s) => live && setSvg(s));
    return () => {
      live = false;
    };
  }, [text]);
  return <Box role="img" aria-label={label} sx={{ width: 96, height: 96, flexShrink: 0, '& svg': { width: '100%', height: '100%' } }} dangerouslySetInnerHTML={svg ? { __html: svg } : undefined} />;
}

/** Two labels per cable, one for each end; each QR code opens the cable's record. A voided cable gets none. */
export function LabelSheet({ cables, areaNames, origin }: { cables: CableRunRow[]; areaNames: Map<string, string>; origin: string }) {
  return (
    <Box component="ul" aria-label="Cable labels" sx={{ listStyle: 'none', p: 0, m: 0, display: 'grid', gridTemplateColumns: 'repeat(auto-fill, minmax(300px, 1fr))', gap: 1.5, '@media print': { gap: '4mm', gridTemplateColumns: 'repeat(2, 1fr)' } }}>
      {unvoided(cables).flatMap((c) =>
        (['A', 'B'] as const).map((e) => (
          <Box
            component="li"
            key={`${c.id}-${e}`}
            aria-label={`Label for ${c.label}, end ${e}`}
            sx={{ display: 'flex', gap: 1.5, alignItems: 'center', p: 1.5, border: '1px dashed', borderColor: 'text.secondary', borderRadius: 1, breakInside: 'avoid', bgcolor: '#ffffff', color: '#14262b' }}
          >
            <Qr text={`${origin}${paths.cable.href(c.id)}`} label={`QR code for cable ${c.label}`} />
            <Box sx={{ minWidth: 0 }}>
              <Typography sx={{ fontSize: '1.6rem', fontWeight: 700, lineHeight: 1.1, color: 'inherit' }}>{c.label}</Typography>
              <Typography sx={{ fontWeight: 500, color: 'inherit' }}>End {e}</Typography>
              <Typography variant="body2" sx={{ color: 'inherit', overflowWrap: 'anywhere' }}>
                {endWords(c, e, areaNames)}
              </Typography>
              <Typography variant="caption" sx={{ color: 'inherit' }}>
                Other end: {endWords(c, e === 'A' ? 'B' : 'A', areaNames)}
              </Typography>
            </Box>
          </Box>
        )),
      )}
    </Box>
  );
}
