import Alert from '@mui/material/Alert';
import LinearProgress from '@mui/material/LinearProgress';
import { useQuery } from '@tanstack/react-query';
import { Navigate, useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { api } from '@/lib/api-client';

interface Found {
  siteId: string;
  jobId: string | null;
}

/** Where a cable belongs at the desk: the cable schedule of the job it was last recorded on, else its site. */
async function findCable(cableId: string, signal?: AbortSignal): Promise<Found> {
  const cable = await api.get<{ siteId: string; lastVisitId: string | null }>(`/cable-runs/${encodeURIComponent(cableId)}`, signal);
  if (!cable.lastVisitId) return { siteId: cable.siteId, jobId: null };
  const visit = await api.get<{ jobId: string }>(`/visits/${encodeURIComponent(cable.lastVisitId)}`, signal);
  return { siteId: cable.siteId, jobId: visit.jobId };
}

export function Component() {
  const { cableId = '' } = useParams();
  const found = useQuery({ queryKey: ['cable-runs', cableId, 'where'], queryFn: ({ signal }) => findCable(cableId, signal), retry: false });
  if (found.isPending) return <LinearProgress aria-label="Finding the cable" />;
  if (found.isError) return <Alert severity="error">{found.error.message}</Alert>;
  return <Navigate to={found.data.jobId ? paths.job.href(found.data.jobId, 'cables') : paths.site.href(found.data.siteId)} replace />;
}
