import { useObjectUrl } from '@/lib/use-object-url';
import { usePhotoDisplay } from '../api/get-photo-display';

/**
 * The address to show a photo from: the bytes this device keeps, else the server's display size (when it can be
 * reached). Null while neither is at hand; `missing` says why.
 */
export function usePhotoSource(photoId: string, kept: { bytes: ArrayBuffer; mime: string } | null | undefined, uploaded: boolean): { src: string | null; missing: string } {
  const keptUrl = useObjectUrl(kept ? `${photoId}/kept` : null, kept?.bytes, kept?.mime);
  const display = usePhotoDisplay(photoId, kept === null && uploaded);
  const serverUrl = useObjectUrl(display.data ? `${photoId}/display` : null, display.data);
  const src = keptUrl ?? serverUrl;
  const missing = kept === undefined || display.fetchStatus === 'fetching' ? 'Loading the photo…' : 'The photo is not on this device: its routes are drawn on its outline.';
  return { src, missing };
}
