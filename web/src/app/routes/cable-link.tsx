import { Navigate, useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useSession } from '@/lib/session';

/** A scanned cable label: the technician's phone opens the record it holds; a desk opens the office's view. */
export function Component() {
  const { cableId = '' } = useParams();
  const role = useSession()?.user.role;
  return <Navigate to={role === 'technician' ? paths.cableOnSite.href(cableId) : paths.cableAtDesk.href(cableId)} replace />;
}
