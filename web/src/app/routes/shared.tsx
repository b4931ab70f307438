import { useParams } from 'react-router-dom';
import { SharedJobPage } from '@/features/share-links/components/shared-job-page';

/** A customer's share link: open to anyone holding it, outside the signed-in app. */
export function Component() {
  const { token = '' } = useParams();
  return <SharedJobPage token={token} />;
}
