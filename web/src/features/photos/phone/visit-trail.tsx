import CableOutlined from '@mui/icons-material/CableOutlined';
import ElectricalServicesOutlined from '@mui/icons-material/ElectricalServicesOutlined';
import EventNoteOutlined from '@mui/icons-material/EventNoteOutlined';
import PowerOutlined from '@mui/icons-material/PowerOutlined';
import SpeedOutlined from '@mui/icons-material/SpeedOutlined';
import StickyNote2Outlined from '@mui/icons-material/StickyNote2Outlined';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import ButtonBase from '@mui/material/ButtonBase';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { useState } from 'react';
import { FINISHED_VISIT_STATUS, isVoided, type VoidableEntity } from '@wiretrail/core';
import { VoidedMark, voidedSx } from '@/components/records/voided-mark';
import { VoidRecord } from '@/components/records/void-record';
import { AidLine } from '@/components/verdicts/verdict-chip';
import { verdictWords } from '@/components/verdicts/verdict-words';
import type { VisitRow } from '@/lib/db';
import { type UploadProgress, useUploadProgress } from '@/lib/photos/upload-progress';
import { type PhotoStates, usePhotoStates } from '../data/get-photo-states';
import { type TrailItem, type VisitEvent, useVisitTrail } from '../data/get-visit-trail';
import { tagList, trailTime } from '../trail-time';
import { LocalPhotoThumb } from './local-photo-thumb';
import { PhotoBadge, photoBadge } from './photo-badge';
import { PhotoCapture } from './photo-capture';
import { TrailPhotoViewer } from './trail-photo-viewer';

/** A visit with hundreds of photos stays quick: the trail shows this many at a time. */
const PAGE = 20;

const POINT_ACTION_WORDS: Record<string, string> = { add: 'New point', move: 'Point moved', remove: 'Point removed', replace: 'Point replaced' };
const EVENT_WORDS: Record<VisitEvent, string> = { arrived: 'Arrived on site', 'cautions-read': 'Safety cautions read', 'signed-off': 'Signed off and finished' };
const READINGS_WORDS: Record<string, string> = { pass: 'All readings pass', fail: 'A reading fails', check: 'Readings to look at' };
const readingsWords = (v: unknown): string => {
  const overall = (v as { verdict?: unknown } | null)?.verdict;
  return (typeof overall === 'string' ? READINGS_WORDS[overall] : null) ?? 'Readings recorded';
};

function IconTile({ children }: { children: ReactNode }) {
  return (
    <Box sx={{ width: 48, height: 48, flexShrink: 0, borderRadius: 1.5, display: 'grid', placeItems: 'center', bgcolor: 'action.hover', color: 'primary.main', '& svg': { fontSize: 28 } }}>
      {children}
    </Box>
  );
}

/** A record the technician may void from the trail: which it is, and how the dialog names it. */
interface Voidable {
  entity: VoidableEntity;
  row: { readonly id: string; readonly voidedAt?: unknown; readonly voidReason?: unknown };
  what: string;
  locked: boolean;
}

function Row({ tile, title, lines, badge, wrap, voidable }: { tile: ReactNode; title: string; lines: string[]; badge?: ReactNode; wrap?: boolean; voidable?: Voidable }) {
  const struck = voidable ? voidedSx(voidable.row) : undefined;
  return (
    <ListItem divider sx={{ gap: 1.5, alignItems: 'flex-start', py: 1.25 }} aria-label={voidable && isVoided(voidable.row) ? `${title} (void)` : undefined}>
      {tile}
      <Stack spacing={0.5} sx={{ minWidth: 0, flex: 1 }}>
        <Typography sx={{ fontWeight: 500, overflowWrap: 'anywhere', ...struck }}>{title}</Typography>
        {lines.filter(Boolean).map((line) => (
          <Typography key={line} variant="body2" color="text.secondary" sx={{ overflowWrap: 'anywhere', whiteSpace: wrap ? 'pre-wrap' : undefined, ...struck }}>
            {line}
          </Typography>
        ))}
        {voidable && <VoidedMark row={voidable.row} />}
        {badge}
        {voidable && <VoidRecord entity={voidable.entity} row={voidable.row} what={voidable.what} locked={voidable.locked} />}
      </Stack>
    </ListItem>
  );
}

interface EntryProps {
  item: TrailItem;
  onOpenPhoto: (id: string) => void;
  areaNames: Map<string, string>;
  subjectNames: Map<string, string>;
  states: PhotoStates | undefined;
  progress: UploadProgress;
  locked: boolean;
}

function TrailEntry({ item, onOpenPhoto, areaNames, subjectNames, states, progress, locked }: EntryProps) {
  const when = trailTime(item.at);
  switch (item.kind) {
    case 'photo': {
      const p = item.photo;
      const caption = p.caption || 'Photo';
      const where = [p.areaId ? areaNames.get(p.areaId) : null, p.subjectId ? subjectNames.get(p.subjectId) : null].filter(Boolean).join(' · ');
      const tags = tagList(p.tags).join(', ');
      return (
        <Row
          tile={
            <ButtonBase onClick={() => onOpenPhoto(p.id)} aria-label={`Open photo: ${caption}`} sx={{ borderRadius: 1.5, flexShrink: 0 }}>
              <LocalPhotoThumb photo={p} alt={caption} />
            </ButtonBase>
          }
          title={caption}
          lines={[[when, where].filter(Boolean).join(' · '), tags]}
          badge={<Box><PhotoBadge look={photoBadge(p, states, progress)} /></Box>}
          voidable={{ entity: 'photo', row: p, what: `the photo “${caption}”`, locked }}
        />
      );
    }
    case 'note':
      return (
        <Row
          tile={<IconTile><StickyNote2Outlined /></IconTile>}
          title={`Note · ${when}`}
          lines={[item.note.text.trim()]}
          wrap
          voidable={{ entity: 'note', row: item.note, what: 'this note', locked }}
        />
      );
    case 'cableRun': {
      const c = item.cable;
      const verdict = verdictWords(c.verdict);
      return (
        <Row
          tile={<IconTile><CableOutlined /></IconTile>}
          title={`Cable ${c.label} · ${when}`}
          lines={[[c.medium, c.scheme, c.lengthM != null ? `${c.lengthM} m` : null, verdict ? `test: ${verdict}` : null].filter(Boolean).join(' · ')]}
          voidable={{ entity: 'cableRun', row: c, what: `cable ${c.label}`, locked }}
        />
      );
    }
    case 'testResult': {
      const circuit = item.result.circuitId ? subjectNames.get(item.result.circuitId) : null;
      return (
        <Row
          tile={<IconTile><SpeedOutlined /></IconTile>}
          title={`Test results${circuit ? `, ${circuit.toLowerCase()}` : ''} · ${when}`}
          lines={[readingsWords(item.result.verdicts)]}
          voidable={{ entity: 'testResult', row: item.result, what: `the test results${circuit ? ` of ${circuit.toLowerCase()}` : ''}`, locked }}
        />
      );
    }
    case 'event':
      return <Row tile={<IconTile><EventNoteOutlined /></IconTile>} title={`${EVENT_WORDS[item.event]} · ${when}`} lines={[]} />;
    case 'circuit':
      return (
        <Row
          tile={<IconTile><ElectricalServicesOutlined /></IconTile>}
          title={`Circuit ${item.circuit.number} added · ${when}`}
          lines={[item.circuit.description ?? '']}
        />
      );
    case 'pointChange': {
      const c = item.change;
      return (
        <Row
          tile={<IconTile><PowerOutlined /></IconTile>}
          title={`${POINT_ACTION_WORDS[String(c.action)] ?? 'Point change'} · ${when}`}
          lines={[String(c.accessoryKind ?? ''), c.toDescription ?? c.fromDescription ?? '']}
          voidable={{ entity: 'pointChange', row: c, what: `this point change${c.accessoryKind ? ` (${c.accessoryKind})` : ''}`, locked }}
        />
      );
    }
  }
}

/** The top of a visit: the camera button, then everything recorded on the visit, newest first. */
export function VisitTrail({ visit, userId, locked = false, extra }: { visit: VisitRow; userId: string; locked?: boolean; extra?: ReactNode }) {
  const trail = useVisitTrail(visit);
  // Read once for the whole list, not once per photo.
  const states = usePhotoStates();
  const progress = useUploadProgress();
  const [shown, setShown] = useState(PAGE);
  const [openId, setOpenId] = useState<string | null>(null);
  const items = trail?.items ?? [];
  const photoRows = items.flatMap((i) => (i.kind === 'photo' ? [i.photo] : []));
  // Voided photos stay in the trail, struck through, but are not counted.
  const photos = photoRows.filter((p) => !isVoided(p)).length;
  // The route says when the visit is locked; a finished visit is, wherever the trail is shown.
  const closed = locked || visit.status === FINISHED_VISIT_STATUS;
  return (
    <Stack component="section" aria-labelledby="trail-heading" spacing={1.5}>
      <Stack direction="row" sx={{ alignItems: 'baseline', justifyContent: 'space-between' }}>
        <Typography variant="h2" id="trail-heading">
          Trail
        </Typography>
        {trail && (
          <Typography variant="body2" color="text.secondary">
            {photos === 1 ? '1 photo' : `${photos} photos`}
          </Typography>
        )}
      </Stack>
      <PhotoCapture visitId={visit.id} siteId={visit.siteId} userId={userId} />
      {extra}
      {trail && items.length === 0 && (
        <Typography color="text.secondary" variant="body2">
          Nothing recorded on this visit yet. Photos, notes, cables, points and test results appear here as you add them, newest first.
        </Typography>
      )}
      {items.length > 0 && (
        <Paper variant="outlined">
          <List aria-label="Trail of this visit" disablePadding>
            {items.slice(0, shown).map((item) => (
              <TrailEntry
                key={`${item.kind}-${item.id}`}
                item={item}
                onOpenPhoto={setOpenId}
                areaNames={trail!.areaNames}
                subjectNames={trail!.subjectNames}
                states={states}
                progress={progress}
                locked={closed}
              />
            ))}
          </List>
        </Paper>
      )}
      {items.some((i) => i.kind === 'cableRun' || i.kind === 'testResult') && <AidLine />}
      {openId && photoRows.some((p) => p.id === openId) && (
        <TrailPhotoViewer
          photos={photoRows}
          openId={openId}
          onOpen={setOpenId}
          onClose={() => setOpenId(null)}
          visitId={visit.id}
          siteId={visit.siteId}
          userId={userId}
          locked={locked}
          states={states}
          progress={progress}
        />
      )}
      {items.length > shown && (
        <Button variant="outlined" size="large" onClick={() => setShown((n) => n + PAGE)}>
          Show {Math.min(PAGE, items.length - shown)} more of {items.length - shown}
        </Button>
      )}
    </Stack>
  );
}
