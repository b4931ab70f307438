import Tab from '@mui/material/Tab';
import Tabs from '@mui/material/Tabs';
import { Link as RouterLink, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';

const SECTIONS = [
  { key: 'trail', label: 'Trail', href: paths.visit.href },
  { key: 'cables', label: 'Cables', href: paths.visitCables.href },
  { key: 'points', label: 'Points', href: paths.visitPoints.href },
  { key: 'tests', label: 'Circuits & tests', href: paths.visitCircuits.href },
  { key: 'sign-off', label: 'Sign-off', href: paths.visitSignOff.href },
] as const;

export type VisitSection = (typeof SECTIONS)[number]['key'];

/** Which section a path is in; a section's own pages (one cable, one circuit) belong to it. */
export function useVisitSection(visitId: string): VisitSection {
  const { pathname } = useLocation();
  const rest = pathname.slice(paths.visit.href(visitId).length).split('/')[1] ?? '';
  return SECTIONS.find((s) => s.key === rest)?.key ?? 'trail';
}

/** The visit's sections as tabs the thumb can reach. */
export function VisitSections({ visitId }: { visitId: string }) {
  const current = useVisitSection(visitId);
  return (
    <Tabs
      value={current}
      variant="fullWidth"
      aria-label="Parts of this visit"
      sx={{
        mx: -2,
        mb: 2,
        borderBottom: 1,
        borderColor: 'divider',
        position: 'sticky',
        top: 56,
        zIndex: 2,
        bgcolor: 'background.default',
        // All five sections across even a 360 px phone: no scroll arrow hides Sign-off; a long name takes two lines.
        '& .MuiTab-root': { minHeight: 52, minWidth: 0, px: 0.5, fontSize: { xs: '0.875rem', sm: '0.95rem' }, lineHeight: 1.2, whiteSpace: 'normal', textWrap: 'balance' },
      }}
    >
      {SECTIONS.map((s) => (
        <Tab key={s.key} value={s.key} label={s.label} component={RouterLink} to={s.href(visitId)} />
      ))}
    </Tabs>
  );
}
