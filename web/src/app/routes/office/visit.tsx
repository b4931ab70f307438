import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import ButtonBase from '@mui/material/ButtonBase';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import { useMemo, useState } from 'react';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { cableStatusWords, MEDIUM_WORDS } from '@/features/cables/cable-words';
import { usePhotos } from '@/features/photos/api/get-photos';
import { useSiteMarkups } from '@/features/photos/api/get-site-markups';
import { ServerPhotoImage } from '@/features/photos/components/server-photo-image';
import { PhotoViewer, type ViewerPhoto } from '@/features/photos/desk/photo-viewer';
import { ACTION_WORDS } from '@/features/points/point-words';
import { useVisitRecord } from '@/features/visits/api/get-visit-record';
import { VisitFacts, VisitParts, VisitSignOff, VisitTimeline } from '@/features/visits/desk/visit-record';
import { type TimelineEntry, visitTimeline, voidedOf } from '@/features/visits/desk/visit-timeline';
import { whenSigned } from '@/features/visits/visit-format';

/** One visit at the desk: everything the technician recorded on it, the sign-off and signature, in time order. */
export function Component() {
  const { jobId = '', visitId = '' } = useParams();
  const record = useVisitRecord(visitId);
  const photos = usePhotos({ visitId, pageSize: 200 });
  const [open, setOpen] = useState<number | null>(null);
  const markups = useSiteMarkups(record.data?.site.id);

  const photoItems = useMemo(() => photos.data?.items ?? [], [photos.data]);
  const viewerPhotos: ViewerPhoto[] = useMemo(
    () =>
      photoItems.map((p) => ({
        id: p.id,
        caption: p.caption,
        takenBy: `${p.createdByName ?? 'A technician'}, ${whenSigned(p.takenAt ?? p.createdAt ?? new Date().toISOString())}`,
        where: '',
        tags: Array.isArray(p.tags) ? p.tags.filter((t): t is string => typeof t === 'string') : [],
        filename: `${record.data?.job.reference ?? 'photo'}-${p.id.slice(-6)}.jpg`,
        routes: markups.get(p.id),
      })),
    [photoItems, record.data, markups],
  );

  if (record.isPending) return <LinearProgress aria-label="Loading the visit" />;
  if (record.isError) return <Alert severity="error">{record.error.message}</Alert>;
  const r = record.data;

  const more: TimelineEntry[] = [
    ...photoItems.map((p, i) => ({
      id: p.id,
      at: p.takenAt ?? p.createdAt ?? '',
      title: 'Photo',
      detail: p.caption,
      by: p.createdByName,
      voided: voidedOf(p),
      media: (
        <ButtonBase onClick={() => setOpen(i)} aria-label={`Open photo: ${p.caption ?? 'no caption'}`} sx={{ borderRadius: 1, overflow: 'hidden', flexShrink: 0 }}>
          <ServerPhotoImage photoId={p.id} variant="thumb" alt="" lazy sx={{ width: 96, height: 72, objectFit: 'cover', display: 'block' }} />
        </ButtonBase>
      ),
    })),
    ...r.pointChanges.map((c) => ({
      id: c.id,
      at: c.recordedAt ?? c.createdAt ?? '',
      title: `Point change: ${ACTION_WORDS[c.action] ?? c.action}, ${c.accessoryKind ?? 'point'}`,
      detail: [c.toDescription ?? c.fromDescription, c.circuitLabel ? `circuit ${c.circuitLabel}` : null].filter(Boolean).join(' · ') || null,
      by: c.createdByName,
      voided: voidedOf(c),
    })),
    ...r.cables.map((c) => ({
      id: c.id,
      at: c.testedAt ?? c.recordedAt ?? c.updatedAt ?? c.createdAt ?? '',
      title: `Cable ${c.label}${c.medium ? ` · ${MEDIUM_WORDS[c.medium] ?? c.medium}` : ''}`,
      detail: [cableStatusWords(c.status ?? null), c.lengthM != null ? `${c.lengthM} m` : null].filter(Boolean).join(' · '),
      by: c.createdByName,
      voided: voidedOf(c),
    })),
  ];

  return (
    <>
      <PageHeader
        title={`Visit of ${r.visit.plannedStart ? whenSigned(r.visit.plannedStart) : 'no date yet'}`}
        subtitle={[r.job.reference, r.job.title, r.site.name ?? r.site.address].filter(Boolean).join(' · ')}
        action={
          <Button component={RouterLink} to={paths.job.href(jobId)}>
            Back to the job
          </Button>
        }
      />
      <Stack spacing={2}>
        <VisitFacts record={r} />
        <VisitTimeline entries={visitTimeline(r, more)} />
        <VisitSignOff record={r} />
        <VisitParts record={r} />
      </Stack>
      <PhotoViewer photos={viewerPhotos} index={open} onIndex={setOpen} onClose={() => setOpen(null)} />
    </>
  );
}
