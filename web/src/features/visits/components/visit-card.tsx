import PlaceOutlined from '@mui/icons-material/PlaceOutlined';
import Card from '@mui/material/Card';
import CardActionArea from '@mui/material/CardActionArea';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { VisitSummary } from '../api/get-upcoming-visits';
import { dayLabel, timeWindow, visitStatusWords } from '../visit-format';

export function siteAddress(s: VisitSummary): string {
  return [s.site?.address, s.site?.postcode].filter(Boolean).join(', ') || 'Address not on this phone yet';
}

/** One visit on Today: when, what, who and where, all tappable. */
export function VisitCard({ summary }: { summary: VisitSummary }) {
  const { visit, job, customer } = summary;
  const title = job?.title ?? 'Visit';
  return (
    <Card variant="outlined">
      <CardActionArea component={RouterLink} to={paths.visit.href(visit.id)} aria-label={`${title}, ${dayLabel(visit.plannedStart ?? new Date().toISOString())} ${timeWindow(visit.plannedStart, visit.plannedEnd)}`}>
        <CardContent>
          <Stack direction="row" sx={{ justifyContent: 'space-between', alignItems: 'center', gap: 1, mb: 0.5 }}>
            <Typography variant="body2" sx={{ fontWeight: 500 }}>
              {visit.plannedStart ? `${dayLabel(visit.plannedStart)} · ` : ''}
              {timeWindow(visit.plannedStart, visit.plannedEnd)}
            </Typography>
            <Chip size="small" label={visitStatusWords(visit.status)} color={visit.status === 'on-site' ? 'secondary' : 'default'} />
          </Stack>
          <Typography variant="h3" component="h2">
            {title}
          </Typography>
          {customer && <Typography color="text.secondary">{customer.name}</Typography>}
          <Stack direction="row" sx={{ gap: 0.5, alignItems: 'flex-start', mt: 0.5, color: 'text.secondary' }}>
            <PlaceOutlined fontSize="small" sx={{ mt: '2px' }} />
            <Typography variant="body2">{siteAddress(summary)}</Typography>
          </Stack>
        </CardContent>
      </CardActionArea>
    </Card>
  );
}
