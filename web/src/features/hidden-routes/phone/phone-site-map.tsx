import ArrowBack from '@mui/icons-material/ArrowBack';
import Button from '@mui/material/Button';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { HiddenRoutesMap, type MapPhoto } from '../components/hidden-routes-map';
import { usePhotoSource } from '../components/photo-source';
import { useKeptPhoto, useSiteHiddenRoutes } from '../data/get-site-hidden-routes';

function usePhoneSource(photo: MapPhoto) {
  const kept = useKeptPhoto(photo.sha256);
  return usePhotoSource(photo.id, kept, photo.uploadState === 'ready');
}

interface Props {
  siteId: string;
  back: { to: string; label: string };
  /** The photo's own screen, with its drilling check. */
  photoLink: (photoId: string) => string;
}

/** The site's hidden routes from this phone's own records: works with no signal for every site in the technician's scope. */
export function PhoneSiteMap({ siteId, back, photoLink }: Props) {
  const data = useSiteHiddenRoutes(siteId);
  if (!data) return <LinearProgress aria-label="Loading the hidden routes" />;
  return (
    <Stack spacing={2} sx={{ p: 2 }}>
      <Button component={RouterLink} to={back.to} startIcon={<ArrowBack />} sx={{ alignSelf: 'flex-start', minHeight: 44 }}>
        {back.label}
      </Button>
      <Typography variant="h6" component="h2">
        Hidden routes on this site
      </Typography>
      <HiddenRoutesMap
        entries={data.entries}
        areas={data.areas}
        cables={data.cables}
        circuits={data.circuits}
        usePhotoSource={usePhoneSource}
        open={(entry) => (
          <Button component={RouterLink} to={photoLink(entry.photo.id)} size="small" sx={{ alignSelf: 'flex-start', minHeight: 44 }}>
            Open and check a drilling point
          </Button>
        )}
      />
    </Stack>
  );
}
