import ImageNotSupportedOutlined from '@mui/icons-material/ImageNotSupportedOutlined';
import Box from '@mui/material/Box';
import Skeleton from '@mui/material/Skeleton';
import type { SxProps, Theme } from '@mui/material/styles';
import type { PhotoVariant } from '@wiretrail/core';
import { useRef } from 'react';
import { useInView } from '@/lib/use-in-view';
import { useObjectUrl } from '@/lib/use-object-url';
import { usePhotoFile } from '../api/get-photo-file';

interface Props {
  photoId: string;
  variant: PhotoVariant;
  alt: string;
  sx?: SxProps<Theme>;
  /** Fetch only once the image is near the screen (long grids). */
  lazy?: boolean;
}

/** A photo size fetched from the server with the signed-in user's token, shown through an object URL. */
export function ServerPhotoImage({ photoId, variant, alt, sx, lazy = false }: Props) {
  const box = useRef<HTMLDivElement>(null);
  const near = useInView(box);
  const file = usePhotoFile(photoId, variant, !lazy || near);
  const url = useObjectUrl(file.data ? `${photoId}/${variant}` : null, file.data);
  return (
    <Box ref={box} sx={{ display: 'grid', placeItems: 'center', overflow: 'hidden', bgcolor: 'action.hover', ...sx }}>
      {url ? (
        <Box component="img" src={url} alt={alt} sx={{ width: '100%', height: '100%', objectFit: variant === 'thumb' ? 'cover' : 'contain', display: 'block' }} />
      ) : file.isError ? (
        <ImageNotSupportedOutlined color="disabled" titleAccess={`${alt}: not available yet`} />
      ) : (
        <Skeleton variant="rectangular" width="100%" height="100%" aria-label={`Loading ${alt}`} />
      )}
    </Box>
  );
}
