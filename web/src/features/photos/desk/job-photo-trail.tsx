import PhotoLibraryOutlined from '@mui/icons-material/PhotoLibraryOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import ButtonBase from '@mui/material/ButtonBase';
import LinearProgress from '@mui/material/LinearProgress';
import Pagination from '@mui/material/Pagination';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useCallback, useMemo, useState } from 'react';
import { type ServerPhoto, usePhotos } from '../api/get-photos';
import { useSiteMarkups } from '../api/get-site-markups';
import { useOfficeTags } from '../api/get-photo-tags';
import { dayAndTime, tagList, trailTime } from '../trail-time';
import { PhotoViewer, type ViewerPhoto } from './photo-viewer';
import { ServerPhotoImage } from '../components/server-photo-image';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import { VoidedMark, voidedSx } from '@/components/records/voided-mark';

/** Enough for a morning's work on one screen; the grid fetches thumbnails only as they scroll into view. */
const PAGE_SIZE = 60;

export interface TrailVisit {
  id: string;
  plannedStart: string | null;
  technicianIds: string[] | null;
}

interface Props {
  jobId: string;
  /** The job's site, whose photo markups are drawn over its photos in the viewer. */
  siteId?: string;
  /** For the names originals download under. */
  reference: string | null;
  areas: { id: string; name: string }[];
  subjects: { type: string; id: string; label: string }[];
  visits: TrailVisit[];
  /** A user's name, where the office may know it. */
  personName: (userId: string) => string | null;
}

interface AreaGroup {
  key: string;
  name: string;
  photos: ServerPhoto[];
}
interface VisitGroup {
  visitId: string;
  plannedStart: string | null;
  areas: AreaGroup[];
}

/** The page's photos by visit (in time order), and within a visit by area (in the order first photographed). */
export function groupTrail(items: ServerPhoto[], areaName: (id: string) => string): VisitGroup[] {
  const visits = new Map<string, VisitGroup>();
  for (const p of items) {
    let visit = visits.get(p.visitId);
    if (!visit) {
      visit = { visitId: p.visitId, plannedStart: p.visitPlannedStart, areas: [] };
      visits.set(p.visitId, visit);
    }
    const key = p.areaId ?? '';
    let area = visit.areas.find((a) => a.key === key);
    if (!area) {
      area = { key, name: key ? areaName(key) : 'No area given', photos: [] };
      visit.areas.push(area);
    }
    area.photos.push(p);
  }
  return [...visits.values()].sort((a, b) => (a.plannedStart ?? '').localeCompare(b.plannedStart ?? ''));
}

const fileTime = (iso: string | null) => (iso ? iso.slice(0, 16).replace(/[-:T]/g, '').replace(/^(\d{8})/, '$1-') : 'photo');

/** A job's photo trail for the office: every photo of every visit in time order, filtered, with a full-screen viewer. */
export function JobPhotoTrail({ jobId, siteId, reference, areas, subjects, visits, personName }: Props) {
  const tags = useOfficeTags();
  const [tag, setTag] = useState('');
  const [areaId, setAreaId] = useState('');
  const [subject, setSubject] = useState('');
  const [technicianId, setTechnicianId] = useState('');
  const [page, setPage] = useState(1);
  const [open, setOpen] = useState<number | null>(null);
  const [subjectType, subjectId] = subject ? subject.split(':') : [undefined, undefined];
  const photos = usePhotos({ jobId, tag, areaId, subjectType, subjectId, technicianId, page, pageSize: PAGE_SIZE });
  const markups = useSiteMarkups(siteId);

  const areaName = useMemo(() => {
    const names = new Map(areas.map((a) => [a.id, a.name]));
    return (id: string) => names.get(id) ?? 'Area not known';
  }, [areas]);
  const subjectName = useMemo(() => new Map(subjects.map((s) => [s.id, s.label])), [subjects]);
  const items = photos.data?.items ?? [];
  const who = useCallback((p: ServerPhoto) => p.createdByName ?? (p.createdById ? personName(p.createdById) : null) ?? 'a technician', [personName]);

  const technicians = useMemo(() => {
    const ids = new Set<string>();
    for (const v of visits) for (const t of v.technicianIds ?? []) ids.add(t);
    for (const p of items) if (p.createdById) ids.add(p.createdById);
    const named = new Map(items.filter((p) => p.createdById && p.createdByName).map((p) => [p.createdById!, p.createdByName!]));
    return [...ids].map((id, i) => ({ id, name: named.get(id) ?? personName(id) ?? `Technician ${i + 1}` })).sort((a, b) => a.name.localeCompare(b.name, 'en-GB'));
  }, [visits, items, personName]);

  const groups = useMemo(() => groupTrail(items, areaName), [items, areaName]);
  // The viewer steps through the photos in the order the grid shows them.
  const ordered = useMemo(() => groups.flatMap((v) => v.areas.flatMap((a) => a.photos)), [groups]);
  const viewerPhotos: ViewerPhoto[] = useMemo(
    () =>
      ordered.map((p) => ({
        id: p.id,
        caption: p.caption,
        takenBy: `${who(p)}, ${trailTime(p.takenAt ?? p.createdAt)}`,
        where: [p.areaId ? areaName(p.areaId) : null, p.subjectId ? subjectName.get(p.subjectId) : null].filter(Boolean).join(' · '),
        tags: tagList(p.tags),
        filename: `${reference ?? 'photo'}-${fileTime(p.takenAt)}-${p.id.slice(-6)}.jpg`,
        routes: markups.get(p.id),
      })),
    [ordered, areaName, subjectName, reference, who, markups],
  );
  const filtered = !!(tag || areaId || subject || technicianId);
  const change = (set: (v: string) => void) => (e: { target: { value: string } }) => {
    set(e.target.value);
    setPage(1);
  };
  const visitTechnicians = (visitId: string) =>
    (visits.find((v) => v.id === visitId)?.technicianIds ?? [])
      .map((id) => technicians.find((t) => t.id === id)?.name)
      .filter(Boolean)
      .join(', ');

  return (
    <Stack component="section" aria-labelledby="photo-trail-heading" spacing={2}>
      <Stack direction="row" sx={{ alignItems: 'baseline', gap: 2 }}>
        <Typography variant="h2" id="photo-trail-heading">
          Photo trail
        </Typography>
        {photos.data && (
          <Typography color="text.secondary">
            {photos.data.total === 1 ? '1 photo' : `${photos.data.total} photos`}
            {filtered ? ' match' : ''}
          </Typography>
        )}
      </Stack>
      <Paper variant="outlined" sx={{ p: 2 }}>
        <Stack direction="row" sx={{ gap: 2, flexWrap: 'wrap', alignItems: 'center' }} role="group" aria-label="Filter photos">
          <TextField select size="small" label="Tag" value={tag} onChange={change(setTag)} slotProps={{ select: { native: true }, inputLabel: { shrink: true } }} sx={{ width: 180 }}>
            <option value="">All tags</option>
            {tags.map((t) => (
              <option key={t} value={t}>
                {t}
              </option>
            ))}
          </TextField>
          <TextField select size="small" label="Area" value={areaId} onChange={change(setAreaId)} slotProps={{ select: { native: true }, inputLabel: { shrink: true } }} sx={{ width: 200 }}>
            <option value="">All areas</option>
            {areas.map((a) => (
              <option key={a.id} value={a.id}>
                {a.name}
              </option>
            ))}
          </TextField>
          <TextField select size="small" label="Shows" value={subject} onChange={change(setSubject)} slotProps={{ select: { native: true }, inputLabel: { shrink: true } }} sx={{ width: 260 }}>
            <option value="">Anything</option>
            {subjects.map((s) => (
              <option key={`${s.type}:${s.id}`} value={`${s.type}:${s.id}`}>
                {s.label}
              </option>
            ))}
          </TextField>
          <TextField select size="small" label="Taken by" value={technicianId} onChange={change(setTechnicianId)} slotProps={{ select: { native: true }, inputLabel: { shrink: true } }} sx={{ width: 200 }}>
            <option value="">Anyone</option>
            {technicians.map((t) => (
              <option key={t.id} value={t.id}>
                {t.name}
              </option>
            ))}
          </TextField>
          {filtered && (
            <Button
              onClick={() => {
                setTag('');
                setAreaId('');
                setSubject('');
                setTechnicianId('');
                setPage(1);
              }}
            >
              Clear filters
            </Button>
          )}
        </Stack>
      </Paper>
      {photos.isFetching && <LinearProgress aria-label="Loading photos" />}
      {photos.isError && <Alert severity="error">{photos.error.message}</Alert>}
      {photos.data && items.length === 0 && (
        <Paper variant="outlined" sx={{ p: 3, display: 'flex', gap: 2, alignItems: 'center' }}>
          <PhotoLibraryOutlined color="secondary" sx={{ fontSize: 40 }} />
          <Typography color="text.secondary">
            {filtered ? 'No photos match these filters.' : 'No photos on this job yet. Photos taken on its visits appear here once the phones have sent them.'}
          </Typography>
        </Paper>
      )}
      {groups.map((g) => (
        <Box key={g.visitId} component="section" aria-label={g.plannedStart ? `Visit on ${dayAndTime(g.plannedStart)}` : 'Visit'}>
          <Typography variant="h3" sx={{ mb: 1 }}>
            {g.plannedStart ? `Visit on ${dayAndTime(g.plannedStart)}` : 'Visit'}
            <Typography component="span" color="text.secondary" sx={{ ml: 1 }}>
              {visitTechnicians(g.visitId)}
            </Typography>
            <Link component={RouterLink} to={paths.visitRecord.href(jobId, g.visitId)} variant="body2" sx={{ ml: 1.5 }}>
              The visit’s record
            </Link>
          </Typography>
          {g.areas.map((a) => (
            <Box key={a.key} sx={{ mb: 2.5 }}>
              <Typography variant="subtitle2" color="text.secondary" sx={{ mb: 1 }}>
                {a.name} · {a.photos.length === 1 ? '1 photo' : `${a.photos.length} photos`}
              </Typography>
              <Box component="ul" aria-label={`${a.name} photos`} sx={{ listStyle: 'none', p: 0, m: 0, display: 'grid', gap: 1.5, gridTemplateColumns: 'repeat(auto-fill, minmax(180px, 1fr))' }}>
                {a.photos.map((p) => {
                  const at = ordered.indexOf(p);
                  const caption = p.caption || 'No caption';
                  return (
                    <Box component="li" key={p.id}>
                      <ButtonBase
                        onClick={() => setOpen(at)}
                        aria-label={`Open photo: ${caption}`}
                        sx={{ display: 'block', width: '100%', textAlign: 'left', borderRadius: 1.5, overflow: 'hidden', border: 1, borderColor: 'divider', bgcolor: 'background.paper', '&:focus-visible': { outline: '3px solid', outlineColor: 'primary.main' } }}
                      >
                        <ServerPhotoImage photoId={p.id} variant="thumb" alt={caption} lazy sx={{ width: '100%', aspectRatio: '4 / 3' }} />
                        <Box sx={{ p: 1 }}>
                          <Typography variant="body2" sx={{ fontWeight: 500, display: '-webkit-box', WebkitLineClamp: 2, WebkitBoxOrient: 'vertical', overflow: 'hidden', minHeight: '2.86em', ...voidedSx(p) }}>
                            {caption}
                          </Typography>
                          <VoidedMark row={p} />
                          <Typography variant="caption" color="text.secondary">
                            {trailTime(p.takenAt ?? p.createdAt)} · {who(p)}
                          </Typography>
                        </Box>
                      </ButtonBase>
                    </Box>
                  );
                })}
              </Box>
            </Box>
          ))}
        </Box>
      ))}
      {photos.data && photos.data.total > PAGE_SIZE && (
        <Pagination
          count={Math.ceil(photos.data.total / PAGE_SIZE)}
          page={page}
          onChange={(_e, p) => {
            setPage(p);
            setOpen(null);
          }}
          sx={{ alignSelf: 'center' }}
        />
      )}
      <PhotoViewer photos={viewerPhotos} index={open} onIndex={setOpen} onClose={() => setOpen(null)} />
    </Stack>
  );
}
