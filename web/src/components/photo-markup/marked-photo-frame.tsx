import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';

interface Props {
  width: number;
  height: number;
  /** The photo's address (an object URL), or null where it cannot be shown: the drawing stands on its own then. */
  src: string | null;
  alt: string;
  /** Why there is no photo to show, said over the blank. */
  missing?: string;
  maxHeight?: string | number;
  children: ReactNode;
}

/** A photo in its own shape with its markup laid exactly over it. */
export function MarkedPhotoFrame({ width, height, src, alt, missing, maxHeight = '60vh', children }: Props) {
  return (
    <Box sx={{ width: '100%', display: 'flex', justifyContent: 'center', bgcolor: 'grey.900' }}>
      <Box sx={{ position: 'relative', aspectRatio: `${width} / ${height}`, width: '100%', maxHeight, maxWidth: `calc(${typeof maxHeight === 'number' ? `${maxHeight}px` : maxHeight} * ${width / height})` }}>
        {src ? (
          <Box component="img" src={src} alt={alt} sx={{ position: 'absolute', inset: 0, width: '100%', height: '100%', display: 'block' }} />
        ) : (
          <Box sx={{ position: 'absolute', inset: 0, display: 'grid', placeItems: 'center', bgcolor: 'grey.700' }}>
            <Typography variant="body2" sx={{ color: 'grey.100', px: 2, textAlign: 'center' }}>
              {missing ?? 'Photo not on this device'}
            </Typography>
          </Box>
        )}
        {children}
      </Box>
    </Box>
  );
}
