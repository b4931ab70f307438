import Box from '@mui/material/Box';
import Skeleton from '@mui/material/Skeleton';
import type { SxProps, Theme } from '@mui/material/styles';
import type { PhotoRow } from '@/lib/db';
import { useObjectUrl } from '@/lib/use-object-url';
import { ServerPhotoImage } from '../components/server-photo-image';
import { usePhotoThumb } from '../data/get-photo-thumb';

/**
 * A photo's thumbnail on the phone: the one made when it was taken, or the server's when this phone never had
 * the photo (taken by someone else). Never the full-size photo.
 */
export function LocalPhotoThumb({ photo, alt, sx }: { photo: PhotoRow; alt: string; sx?: SxProps<Theme> }) {
  const sha = photo.sha256 ?? '';
  const thumb = usePhotoThumb(sha);
  const url = useObjectUrl(thumb ? sha : null, thumb?.bytes, thumb?.mime);
  const box = { width: 88, height: 88, borderRadius: 1.5, overflow: 'hidden', flexShrink: 0, ...sx } as SxProps<Theme>;
  if (thumb === null) return <ServerPhotoImage photoId={photo.id} variant="thumb" alt={alt} lazy sx={box} />;
  return (
    <Box sx={box}>
      {url ? (
        <Box component="img" src={url} alt={alt} sx={{ width: '100%', height: '100%', objectFit: 'cover', display: 'block' }} />
      ) : (
        <Skeleton variant="rectangular" width="100%" height="100%" />
      )}
    </Box>
  );
}
