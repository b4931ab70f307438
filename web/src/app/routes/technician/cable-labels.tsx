import ArrowBack from '@mui/icons-material/ArrowBack';
import PrintOutlined from '@mui/icons-material/PrintOutlined';
import Button from '@mui/material/Button';
import GlobalStyles from '@mui/material/GlobalStyles';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useSiteCables } from '@/features/cables/data/get-site-cables';
import { LabelSheet } from '@/features/cables/phone/label-sheet';
import { useVisit } from '@/features/visits/data/get-visit';
import { unvoided } from '@wiretrail/core';

/** A sheet of cable labels to print (or show to a label printer app); only the labels go to paper. */
export function Component() {
  const { visitId = '' } = useParams();
  const summary = useVisit(visitId);
  const site = useSiteCables(summary?.visit.siteId ?? '');
  if (!summary || !site) return null;
  const printed = unvoided(site.cables).length;
  return (
    <>
      <GlobalStyles styles={{ '@media print': { 'header, nav, [data-print="hide"]': { display: 'none !important' }, body: { background: '#fff' }, main: { padding: '0 !important' } } }} />
      <Stack spacing={1.5} data-print="hide" sx={{ mb: 2 }}>
        <Button component={RouterLink} to={paths.visitCables.href(visitId)} startIcon={<ArrowBack />} sx={{ alignSelf: 'flex-start', ml: -1.5 }}>
          Cables
        </Button>
        <Typography variant="h1">Cable labels</Typography>
        <Typography color="text.secondary">
          {summary.site?.name ?? summary.site?.address}: {printed === 1 ? '1 cable' : `${printed} cables`}, a label for each end. Scanning a code opens that cable’s record.
        </Typography>
        <Button variant="contained" size="large" startIcon={<PrintOutlined />} onClick={() => window.print()}>
          Print labels
        </Button>
      </Stack>
      <LabelSheet cables={site.cables} areaNames={site.areaNames} origin={window.location.origin} />
    </>
  );
}
