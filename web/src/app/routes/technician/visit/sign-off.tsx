import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PartsUsed } from '@/features/parts/components/parts-used';
import { useSignOff } from '@/features/sign-off/data/get-sign-off';
import { InspectionSchedule } from '@/features/sign-off/components/inspection-schedule';
import { InstallationChecks } from '@/features/sign-off/components/installation-checks';
import { SignOffForm } from '@/features/sign-off/components/sign-off-form';
import { SignOffSummaryView } from '@/features/sign-off/components/sign-off-summary';
import { whenSigned } from '@/features/visits/visit-format';
import { useVisitContext } from '../visit-context';

export function Component() {
  const { summary, userName, locked } = useVisitContext();
  const { visit, job } = summary;
  const signOff = useSignOff(visit, userName);
  if (!signOff) return null;
  return (
    <Stack spacing={2}>
      <Typography variant="h2">Sign-off</Typography>
      <SignOffSummaryView summary={signOff} signed={locked} />
      <PartsUsed visitId={visit.id} siteId={visit.siteId} locked={locked} />
      <InstallationChecks
        key={[signOff.site?._base.version, ...signOff.boards.map((b) => `${b.id}-${b._base.version}`)].join(' ')}
        site={signOff.site}
        boards={signOff.boards}
        locked={locked}
      />
      {signOff.choice.kind === 'installation-certificate' && (
        <>
          <Button component={RouterLink} to={paths.visitSchedule.href(visit.id)} variant="outlined" sx={{ alignSelf: 'flex-start' }}>
            Schedule of circuits, card by card
          </Button>
          <InspectionSchedule visit={visit} locked={locked} />
        </>
      )}
      {locked ? (
        <Paper variant="outlined" sx={{ p: 2 }} component="section" aria-label="Signed">
          <Stack spacing={1}>
            <Typography sx={{ fontWeight: 500 }}>
              Signed by {visit.signedByName}
              {visit.signedByPosition ? `, ${visit.signedByPosition}` : ''} {visit.signedAt ? `· ${whenSigned(visit.signedAt)}` : ''}
            </Typography>
            {visit.signatureSvg && (
              <Box component="img" alt={`Signature of ${visit.signedByName ?? 'the signer'}`} src={`data:image/svg+xml;charset=utf-8,${encodeURIComponent(visit.signatureSvg)}`} sx={{ maxWidth: '100%', bgcolor: '#fbfbf8', borderRadius: 1 }} />
            )}
            <Typography variant="body2">
              <strong>Work:</strong> {visit.workDescription}
            </Typography>
            {visit.observations && (
              <Typography variant="body2">
                <strong>Observations:</strong> {visit.observations}
              </Typography>
            )}
            {visit.departures && (
              <Typography variant="body2">
                <strong>Noted:</strong> {visit.departures}
              </Typography>
            )}
            {visit.existingInstallationComments && (
              <Typography variant="body2">
                <strong>Existing installation:</strong> {visit.existingInstallationComments}
              </Typography>
            )}
            {visit.permittedExceptions && (
              <Typography variant="body2">
                <strong>Permitted exceptions:</strong> {visit.permittedExceptions}
                {visit.riskAssessmentRef ? ` (risk assessment ${visit.riskAssessmentRef})` : ''}
              </Typography>
            )}
            {signOff.certificate.departures.map((d, i) => (
              <Typography variant="body2" key={i}>
                <strong>Departure from Reg {d.regulation}:</strong> {d.instead} No less safe because: {d.noLessSafe}
              </Typography>
            ))}
          </Stack>
        </Paper>
      ) : (
        <SignOffForm visit={visit} defaultDescription={job?.title ?? ''} signerName={userName} signerPosition={signOff.lastPosition} problemCount={signOff.problems.length} />
      )}
    </Stack>
  );
}
