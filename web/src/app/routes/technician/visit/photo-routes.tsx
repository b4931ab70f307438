import { useParams, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PhotoRoutesScreen } from '@/features/hidden-routes/phone/photo-routes-screen';
import { useVisitContext } from '../visit-context';

export function Component() {
  const { summary, locked } = useVisitContext();
  const { photoId = '' } = useParams();
  const [search] = useSearchParams();
  const visitId = summary.visit.id;
  const fromMap = search.get('from') === 'map';
  const back = fromMap ? { to: paths.visitHiddenRoutes.href(visitId), label: 'Hidden routes' } : { to: paths.visit.href(visitId), label: 'Trail' };
  return <PhotoRoutesScreen photoId={photoId} visitId={visitId} locked={locked} back={back} mapLink={fromMap ? undefined : paths.visitHiddenRoutes.href(visitId)} />;
}
