import { paths } from '@/config/paths';
import { PhoneSiteMap } from '@/features/hidden-routes/phone/phone-site-map';
import { useVisitContext } from '../visit-context';

export function Component() {
  const { summary } = useVisitContext();
  const { visit } = summary;
  return (
    <PhoneSiteMap
      siteId={visit.siteId}
      back={{ to: paths.visit.href(visit.id), label: 'Trail' }}
      photoLink={(photoId) => `${paths.visitPhotoRoutes.href(visit.id, photoId)}?from=map`}
    />
  );
}
