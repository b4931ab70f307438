import AddOutlined from '@mui/icons-material/AddOutlined';
import Button from '@mui/material/Button';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { PointChangeRow } from '@/lib/db';
import { useVisitPoints } from '../data/get-visit-points';
import { ACTION_WORDS, CONNECTION_WORDS } from '../point-words';
import { isVoided, voidWords } from '@wiretrail/core';
import { VOIDED_SX } from '@/components/records/voided-mark';

export function placeWords(p: PointChangeRow, side: 'from' | 'to', areaNames: Map<string, string>): string {
  const area = p[`${side}AreaId`];
  const height = p[`${side}HeightMm`];
  return [area ? areaNames.get(area) : null, p[`${side}Description`], height != null ? `${height} mm up` : null].filter(Boolean).join(', ');
}

/** The points changed on this visit, in the order they were recorded. */
export function PointList({ visitId, siteId, locked }: { visitId: string; siteId: string; locked: boolean }) {
  const data = useVisitPoints(visitId, siteId);
  if (!data) return null;
  const areaNames = new Map(data.areas.map((a) => [a.id, a.name]));
  const circuitNames = new Map(data.circuits.map((c) => [c.id, `circuit ${c.number}`]));
  return (
    <Stack spacing={1.5} component="section" aria-labelledby="points-heading">
      <Typography variant="h2" id="points-heading">
        Points changed on this visit
      </Typography>
      {!locked && (
        <Button component={RouterLink} to={paths.visitPoint.href(visitId, 'new')} variant="contained" size="large" startIcon={<AddOutlined />}>
          Record a point change
        </Button>
      )}
      {data.points.length === 0 ? (
        <Typography color="text.secondary" variant="body2">
          Nothing yet. Record each socket or spur added, moved, taken out or replaced, with where it joins its circuit.
        </Typography>
      ) : (
        <Paper variant="outlined">
          <List aria-label="Point changes" disablePadding>
            {data.points.map((p) => {
              const from = placeWords(p, 'from', areaNames);
              const to = placeWords(p, 'to', areaNames);
              return (
                <ListItem key={p.id} disablePadding divider>
                  <ListItemButton component={RouterLink} to={paths.visitPoint.href(visitId, p.id)}>
                    <ListItemText
                      primary={`${ACTION_WORDS[p.action] ?? p.action}: ${p.accessoryKind ?? 'point'}`}
                      slotProps={isVoided(p) ? { primary: { sx: VOIDED_SX } } : undefined}
                      secondary={[
                        isVoided(p) ? voidWords(p) : null,
                        from && to ? `${from} → ${to}` : from || to,
                        [p.circuitId ? circuitNames.get(p.circuitId) : null, p.connection ? CONNECTION_WORDS[p.connection] : null, p.fuseRatingA ? `${p.fuseRatingA}\u00a0A fuse` : null]
                          .filter(Boolean)
                          .join(' · '),
                      ]
                        .filter(Boolean)
                        .join(' — ')}
                    />
                  </ListItemButton>
                </ListItem>
              );
            })}
          </List>
        </Paper>
      )}
    </Stack>
  );
}
