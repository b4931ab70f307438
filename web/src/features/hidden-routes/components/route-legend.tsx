import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { type MarkedRoute, type MarkedRouteCheck, routeColour } from '@wiretrail/core';
import type { ReactNode } from 'react';
import { VerdictChip } from '@/components/verdicts/verdict-chip';

interface Props {
  routes: readonly MarkedRoute[];
  labels: readonly string[];
  checks: readonly MarkedRouteCheck[];
  /** Buttons beside each route (change, remove), on the phone while the visit is open. */
  actions?: (route: MarkedRoute, index: number) => ReactNode;
  dimmed?: (route: MarkedRoute) => boolean;
}

/** Each drawn route by its number and colour: what it is, how deep, and what the safe-zone check makes of it, with the source. */
export function RouteLegend({ routes, labels, checks, actions, dimmed }: Props) {
  if (!routes.length) return null;
  return (
    <Stack component="ol" spacing={1} sx={{ listStyle: 'none', p: 0, m: 0 }} aria-label="Routes on this photo">
      {routes.map((r, i) => {
        const check = checks[i];
        return (
          <Box component="li" key={r.id} sx={{ display: 'flex', gap: 1, alignItems: 'flex-start', opacity: dimmed?.(r) ? 0.55 : 1 }}>
            <Box aria-hidden sx={{ flex: '0 0 auto', width: 26, height: 26, borderRadius: '50%', bgcolor: routeColour(i), color: '#fff', display: 'grid', placeItems: 'center', fontWeight: 700, fontSize: 14, mt: 0.5 }}>
              {i + 1}
            </Box>
            <Stack spacing={0.5} sx={{ flex: 1, minWidth: 0 }}>
              <Typography sx={{ fontWeight: 500 }}>
                Route {i + 1}: {labels[i]}
              </Typography>
              <Typography variant="body2" color="text.secondary">
                {r.depthMm !== null && r.depthMm !== undefined ? `${r.depthMm} mm deep` : 'Depth not typed'}
                {check?.wallRoute ? ` · runs ${check.wallRoute.map((p) => `(${p.x}, ${p.y})`).join(' to ')} mm` : ''}
              </Typography>
              {check && (
                <Stack spacing={0.5} sx={{ alignItems: 'flex-start' }}>
                  <VerdictChip what={`Safe zones, route ${i + 1}`} result={check} against="none" size="small" />
                  {check.verdict !== 'pass' && (
                    <Typography variant="body2">
                      {check.note} <Typography component="span" variant="caption" color="text.secondary">Source: {check.source}</Typography>
                    </Typography>
                  )}
                </Stack>
              )}
            </Stack>
            {actions?.(r, i)}
          </Box>
        );
      })}
    </Stack>
  );
}
