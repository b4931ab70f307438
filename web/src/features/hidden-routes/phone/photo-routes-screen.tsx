import ArrowBack from '@mui/icons-material/ArrowBack';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { usePhotoSource } from '../components/photo-source';
import { usePhotoMarkup } from '../data/get-photo-markup';
import { MarkupEditor } from './markup-editor';

interface Props {
  photoId: string;
  visitId: string;
  locked: boolean;
  /** Where "Back" goes: the trail, or the site's map of hidden routes. */
  back: { to: string; label: string };
  mapLink?: string;
}

/** One photo with the routes drawn over it, to draw on while the visit is open and to check a drilling point on at any time. */
export function PhotoRoutesScreen({ photoId, visitId, locked, back, mapLink }: Props) {
  const data = usePhotoMarkup(photoId);
  const source = usePhotoSource(photoId, data === undefined ? undefined : data.bytes, data?.photo?.uploadState === 'ready');
  if (data === undefined) return <LinearProgress aria-label="Loading the photo" />;
  if (!data.photo) return <Alert severity="warning">This photo is not on this phone.</Alert>;
  return (
    <Stack spacing={1} sx={{ pb: 3 }}>
      <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between', px: 1, gap: 1, flexWrap: 'wrap' }}>
        <Button component={RouterLink} to={back.to} startIcon={<ArrowBack />} sx={{ minHeight: 44 }}>
          {back.label}
        </Button>
        {mapLink && (
          <Button component={RouterLink} to={mapLink} sx={{ minHeight: 44 }}>
            Hidden routes on this site
          </Button>
        )}
      </Stack>
      <Typography variant="h6" component="h2" sx={{ px: 2 }}>
        Cable routes: {data.photo.caption || 'photo of the wall'}
      </Typography>
      <MarkupEditor key={photoId} photo={data.photo} markup={data.markup} cables={data.cables} circuits={data.circuits} visitId={visitId} locked={locked} src={source.src} missing={source.missing} />
    </Stack>
  );
}
