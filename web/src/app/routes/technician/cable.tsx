import CableOutlined from '@mui/icons-material/CableOutlined';
import Typography from '@mui/material/Typography';
import { Navigate, useParams } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { paths } from '@/config/paths';
import { useCable, useSiteCables } from '@/features/cables/data/get-site-cables';
import { CableForm } from '@/features/cables/phone/cable-form';
import { useOpenVisitAt } from '@/features/visits/data/get-open-visit';
import { useSession } from '@/lib/session';

/**
 * Where a label's QR code lands. On a visit at the cable's site the record opens inside that visit, ready to
 * edit; otherwise it is shown read-only.
 */
export function Component() {
  const { cableId = '' } = useParams();
  const userId = useSession()?.user.id ?? '';
  const cable = useCable(cableId);
  const site = useSiteCables(cable?.siteId ?? '');
  const visit = useOpenVisitAt(cable?.siteId, userId);
  if (cable === undefined || visit === undefined || (cable && !site)) return null;
  if (!cable) {
    return (
      <EmptyState icon={<CableOutlined />} title="This cable is not on this phone">
        It belongs to a site none of your visits are at, or it has not reached this phone yet.
      </EmptyState>
    );
  }
  if (visit) return <Navigate to={paths.visitCable.href(visit.id, cable.id)} replace />;
  return (
    <>
      <Typography variant="h1" sx={{ mb: 1 }}>
        Cable {cable.label}
      </Typography>
      <Typography color="text.secondary" sx={{ mb: 2 }}>
        No open visit of yours at this site, so the record is shown as it stands.
      </Typography>
      <CableForm siteId={cable.siteId} visitId="" cable={cable} areas={site!.areas} locked onSaved={() => undefined} />
    </>
  );
}
