import ChevronRight from '@mui/icons-material/ChevronRight';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemText from '@mui/material/ListItemText';
import ListSubheader from '@mui/material/ListSubheader';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { circuitKindWords, readingsOf } from '@wiretrail/core';
import { Link as RouterLink } from 'react-router-dom';
import { VerdictChip } from '@/components/verdicts/verdict-chip';
import { paths } from '@/config/paths';
import type { CircuitRow } from '@/lib/db';
import { usePendingIds } from '@/lib/sync/use-pending-ids';
import { type CircuitTests, useCircuitTests } from '../data/get-circuit-tests';
import { assess } from '../circuit-readings';
import { AddCircuitForm } from './add-circuit-form';

function CircuitItem({ circuit, data, visitId, waiting }: { circuit: CircuitRow; data: CircuitTests; visitId: string; waiting: boolean }) {
  const result = data.results.get(circuit.id);
  const altered = data.altered.has(circuit.id);
  const verdict = result ? assess(circuit, readingsOf(result), data.site?.earthing).verdict : null;
  const device = circuit.deviceType && circuit.deviceRatingA ? `${circuit.deviceType}${circuit.deviceRatingA}` : null;
  return (
    <ListItem disablePadding divider>
      <ListItemButton component={RouterLink} to={paths.visitCircuit.href(visitId, circuit.id)} sx={{ gap: 1 }}>
        <ListItemText
          primary={`${circuit.number} · ${circuit.description || 'No description'}`}
          secondary={[circuit.kind ? circuitKindWords(circuit.kind) : null, device, circuit.rcdRatingMa ? `${circuit.rcdRatingMa} mA RCD` : null, altered ? 'altered on this visit' : null, waiting ? 'waiting to send' : null]
            .filter(Boolean)
            .join(' · ')}
        />
        {verdict ? (
          <VerdictChip verdict={verdict} prefix="Tests" />
        ) : altered ? (
          <Chip size="small" color="warning" variant="outlined" label="Not tested" />
        ) : null}
        <ChevronRight color="action" />
      </ListItemButton>
    </ListItem>
  );
}

/** The site's boards and circuits; each opens its readings for this visit. A circuit found on site can be added. */
export function CircuitList({ visitId, siteId, locked }: { visitId: string; siteId: string; locked: boolean }) {
  const data = useCircuitTests(visitId, siteId);
  const pending = usePendingIds('circuit');
  if (!data) return null;
  const empty = data.boards.every((b) => b.circuits.length === 0) && data.loose.length === 0;
  return (
    <Stack component="section" aria-labelledby="circuits-heading" spacing={1.5}>
      <Typography variant="h2" id="circuits-heading">
        Circuits
      </Typography>
      {empty ? (
        <Typography color="text.secondary" variant="body2">
          No circuits recorded for this site yet.
        </Typography>
      ) : (
        <Paper variant="outlined">
          <List aria-label="Circuits on this site" disablePadding>
            {data.boards
              .filter((b) => b.circuits.length > 0)
              .map(({ board, circuits }) => (
                <li key={board.id}>
                  <ul style={{ padding: 0 }}>
                    <ListSubheader sx={{ bgcolor: 'background.paper' }}>{board.name}</ListSubheader>
                    {circuits.map((c) => (
                      <CircuitItem key={c.id} circuit={c} data={data} visitId={visitId} waiting={pending.has(c.id)} />
                    ))}
                  </ul>
                </li>
              ))}
            {data.loose.map((c) => (
              <CircuitItem key={c.id} circuit={c} data={data} visitId={visitId} waiting={pending.has(c.id)} />
            ))}
          </List>
        </Paper>
      )}
      <Button component={RouterLink} to={paths.visitSchedule.href(visitId)} variant="outlined" sx={{ alignSelf: 'flex-start' }}>
        Schedule of circuits, card by card
      </Button>
      {!locked && <AddCircuitForm siteId={siteId} visitId={visitId} boards={data.boards.map((b) => b.board)} />}
    </Stack>
  );
}
