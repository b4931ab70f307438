import AddOutlined from '@mui/icons-material/AddOutlined';
import EditOutlined from '@mui/icons-material/EditOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Chip from '@mui/material/Chip';
import IconButton from '@mui/material/IconButton';
import LinearProgress from '@mui/material/LinearProgress';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { type ReactNode, useState } from 'react';
import { type Area, useSiteAreas } from '../api/get-areas';
import { type Board, useSiteBoards } from '../api/get-circuits';
import { AreaDialog } from './forms/area-dialog';
import { BoardDialog } from './forms/board-dialog';

function Panel({ title, action, children }: { title: string; action: ReactNode; children: ReactNode }) {
  return (
    <Paper variant="outlined" component="section" aria-label={title} sx={{ p: 2, flex: 1, minWidth: 0 }}>
      <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between', mb: 1 }}>
        <Typography variant="h3">{title}</Typography>
        {action}
      </Stack>
      {children}
    </Paper>
  );
}

const areaName = (a: Area) => (a.level ? `${a.name} (${a.level})` : a.name);

/** The rooms and places of a site, and its distribution boards: what technicians choose from on site. */
export function SiteAreasAndBoards({ siteId }: { siteId: string }) {
  const areas = useSiteAreas(siteId);
  const boards = useSiteBoards(siteId);
  const [area, setArea] = useState<Area | 'new' | null>(null);
  const [board, setBoard] = useState<Board | 'new' | null>(null);
  if (areas.isPending || boards.isPending) return <LinearProgress aria-label="Loading areas and boards" />;
  if (areas.isError) return <Alert severity="error">{areas.error.message}</Alert>;
  if (boards.isError) return <Alert severity="error">{boards.error.message}</Alert>;
  const where = new Map(areas.data.items.map((a) => [a.id, areaName(a)]));
  return (
    <Stack direction="row" spacing={2} sx={{ alignItems: 'stretch' }}>
      <Panel title="Areas" action={<Button startIcon={<AddOutlined />} onClick={() => setArea('new')}>Add area</Button>}>
        {areas.data.items.length === 0 ? (
          <Typography color="text.secondary">No areas yet. Add the rooms where work happens, such as “Lounge” or “Loft”.</Typography>
        ) : (
          <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }}>
            {areas.data.items.map((a) => (
              <Chip key={a.id} label={areaName(a)} variant="outlined" onClick={() => setArea(a)} aria-label={`Change ${a.name}`} />
            ))}
          </Stack>
        )}
      </Panel>
      <Panel title="Boards" action={<Button startIcon={<AddOutlined />} onClick={() => setBoard('new')}>Add board</Button>}>
        {boards.data.items.length === 0 ? (
          <Typography color="text.secondary">No boards yet.</Typography>
        ) : (
          <List dense disablePadding>
            {boards.data.items.map((b) => (
              <ListItem
                key={b.id}
                disableGutters
                secondaryAction={
                  <IconButton edge="end" aria-label={`Change ${b.name}`} onClick={() => setBoard(b)}>
                    <EditOutlined />
                  </IconButton>
                }
              >
                <ListItemText primary={b.name} secondary={[b.areaId ? where.get(b.areaId) : null, b.description].filter(Boolean).join(' · ') || undefined} />
              </ListItem>
            ))}
          </List>
        )}
      </Panel>
      {area && <AreaDialog siteId={siteId} area={area === 'new' ? undefined : area} onClose={() => setArea(null)} />}
      {board && <BoardDialog siteId={siteId} board={board === 'new' ? undefined : board} areas={areas.data.items} onClose={() => setBoard(null)} />}
    </Stack>
  );
}
