import Button from '@mui/material/Button';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import ListSubheader from '@mui/material/ListSubheader';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { CIRCUIT_KINDS } from '@wiretrail/core';
import { type FormEvent, useState } from 'react';
import { v7 as uuidv7 } from 'uuid';
import { SafetyCaution } from '@/components/safety-caution';
import type { CircuitRow } from '@/lib/db';
import { createRecords, type Fields } from '@/lib/sync/local-write';
import { usePendingIds } from '../api/get-pending-ids';
import { useSiteCircuits } from '../api/get-site-circuits';
import { CIRCUIT_KIND_WORDS } from '../visit-format';

const NEW_BOARD = 'new';

function CircuitItem({ circuit, waiting }: { circuit: CircuitRow; waiting: boolean }) {
  const kind = circuit.kind ? CIRCUIT_KIND_WORDS[circuit.kind] : null;
  return (
    <ListItem divider>
      <ListItemText
        primary={`${circuit.number} · ${circuit.description || 'No description'}`}
        secondary={[kind, waiting ? 'waiting to send' : null].filter(Boolean).join(' · ') || undefined}
      />
    </ListItem>
  );
}

/** The site's boards and circuits, and a short form to add a circuit found on site. */
export function VisitCircuits({ siteId }: { siteId: string }) {
  const data = useSiteCircuits(siteId);
  const pending = usePendingIds('circuit');
  const [boardChoice, setBoardChoice] = useState('');
  const [boardName, setBoardName] = useState('');
  const [number, setNumber] = useState('');
  const [description, setDescription] = useState('');
  const [kind, setKind] = useState<string>('ring');
  const [errors, setErrors] = useState<{ board?: string; number?: string; form?: string }>({});
  const [saved, setSaved] = useState(false);

  const boards = data?.boards ?? [];
  // With no board on the phone yet, the form asks for one by name.
  const boardId = boardChoice || boards[0]?.board.id || NEW_BOARD;
  const addingBoard = boardId === NEW_BOARD;

  async function onSubmit(e: FormEvent) {
    e.preventDefault();
    const next: typeof errors = {};
    if (addingBoard && !boardName.trim()) next.board = 'Name the board, for example "Consumer unit, hall".';
    if (!number.trim()) next.number = 'Give the circuit number or way.';
    setErrors(next);
    if (next.board || next.number) return;
    const items: { entity: 'board' | 'circuit'; id?: string; fields: Fields }[] = [];
    let targetBoard = boardId;
    if (addingBoard) {
      targetBoard = uuidv7();
      items.push({ entity: 'board', id: targetBoard, fields: { siteId, name: boardName.trim() } });
    }
    const circuit: Fields = { siteId, boardId: targetBoard, number: number.trim(), kind };
    if (description.trim()) circuit.description = description.trim();
    items.push({ entity: 'circuit', fields: circuit });
    try {
      await createRecords(items);
      setBoardChoice(targetBoard);
      setBoardName('');
      setNumber('');
      setDescription('');
      setSaved(true);
    } catch (err) {
      setErrors({ form: (err as Error).message });
    }
  }

  const empty = data && boards.every((b) => b.circuits.length === 0) && data.loose.length === 0;
  return (
    <Stack component="section" aria-labelledby="circuits-heading" spacing={1.5}>
      <Typography variant="h2" id="circuits-heading">
        Circuits
      </Typography>
      <SafetyCaution />
      {data && !empty && (
        <Paper variant="outlined">
          <List aria-label="Circuits on this site" disablePadding>
            {boards
              .filter((b) => b.circuits.length > 0)
              .map(({ board, circuits }) => (
                <li key={board.id}>
                  <ul style={{ padding: 0 }}>
                    <ListSubheader sx={{ bgcolor: 'background.paper' }}>{board.name}</ListSubheader>
                    {circuits.map((c) => (
                      <CircuitItem key={c.id} circuit={c} waiting={pending.has(c.id)} />
                    ))}
                  </ul>
                </li>
              ))}
            {data.loose.map((c) => (
              <CircuitItem key={c.id} circuit={c} waiting={pending.has(c.id)} />
            ))}
          </List>
        </Paper>
      )}
      {empty && (
        <Typography color="text.secondary" variant="body2">
          No circuits recorded for this site yet.
        </Typography>
      )}
      <Paper variant="outlined" component="form" aria-label="Add a circuit" onSubmit={onSubmit} noValidate sx={{ p: 2 }}>
        <Stack spacing={1.5}>
          <Typography variant="h3">Add a circuit</Typography>
          {boards.length > 0 && (
            <TextField select label="Board" value={boardId} onChange={(e) => setBoardChoice(e.target.value)} slotProps={{ select: { native: true } }}>
              {boards.map(({ board }) => (
                <option key={board.id} value={board.id}>
                  {board.name}
                </option>
              ))}
              <option value={NEW_BOARD}>Another board…</option>
            </TextField>
          )}
          {addingBoard && (
            <TextField
              label="Board name"
              value={boardName}
              onChange={(e) => setBoardName(e.target.value)}
              error={!!errors.board}
              helperText={errors.board ?? 'The board this circuit is fed from.'}
            />
          )}
          <TextField
            label="Circuit number"
            value={number}
            onChange={(e) => {
              setNumber(e.target.value);
              setSaved(false);
            }}
            error={!!errors.number}
            helperText={errors.number ?? ' '}
            slotProps={{ htmlInput: { maxLength: 20, inputMode: 'text', autoCapitalize: 'characters' } }}
          />
          <TextField label="Description" value={description} onChange={(e) => setDescription(e.target.value)} slotProps={{ htmlInput: { maxLength: 500 } }} />
          <TextField select label="Kind" value={kind} onChange={(e) => setKind(e.target.value)} slotProps={{ select: { native: true } }}>
            {CIRCUIT_KINDS.map((k) => (
              <option key={k} value={k}>
                {CIRCUIT_KIND_WORDS[k]}
              </option>
            ))}
          </TextField>
          {errors.form && (
            <Typography color="error" role="alert">
              {errors.form}
            </Typography>
          )}
          <Button type="submit" variant="contained" size="large">
            Add circuit
          </Button>
          <Typography variant="body2" color="text.secondary" role="status">
            {saved ? 'Circuit saved on this phone.' : ''}
          </Typography>
        </Stack>
      </Paper>
    </Stack>
  );
}
