import Chip, { type ChipProps } from '@mui/material/Chip';
import type { PhotoRow } from '@/lib/db';
import type { UploadProgress } from '@/lib/photos/upload-progress';
import type { PhotoStates } from '../data/get-photo-states';

export interface BadgeLook {
  label: string;
  color: ChipProps['color'];
}

const percent = (part: number) => `${Math.min(99, Math.floor(part * 100))} %`;

/** Where a photo stands, in a word or two: Waiting, Sending n %, On server, or Refused with the server's reason. */
export function photoBadge(photo: Pick<PhotoRow, 'sha256' | 'uploadState'>, states: PhotoStates | undefined, progress: UploadProgress): BadgeLook {
  const local = photo.sha256 ? states?.bySha.get(photo.sha256) : undefined;
  if (photo.uploadState === 'ready' || local?.state === 'confirmed' || local?.state === 'freed') return { label: 'On server', color: 'success' };
  if (local?.state === 'refused' || photo.uploadState === 'refused') {
    return { label: `Refused: ${local?.reason ?? 'the office system did not accept this photo'}`, color: 'error' };
  }
  const live = photo.sha256 ? progress.bySha[photo.sha256] : undefined;
  if (live && progress.active && live.total > 0) return { label: `Sending ${percent(live.sent / live.total)}`, color: 'info' };
  const partly = photo.sha256 ? states?.partly.get(photo.sha256) : undefined;
  if (partly) return { label: `Waiting · ${percent(partly)} sent`, color: 'warning' };
  return { label: 'Waiting', color: 'warning' };
}

export function PhotoBadge({ look }: { look: BadgeLook }) {
  return (
    <Chip
      size="small"
      variant={look.color === 'success' ? 'filled' : 'outlined'}
      color={look.color}
      label={look.label}
      sx={{ maxWidth: '100%', height: 'auto', minHeight: 24, '& .MuiChip-label': { whiteSpace: 'normal', py: 0.25 } }}
    />
  );
}
