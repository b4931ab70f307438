import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import LinearProgress from '@mui/material/LinearProgress';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { CERTIFICATE_WORDS, type CertificateKind, type InstallationParticulars, particularsProblems } from '@wiretrail/core';
import { useEffect } from 'react';
import { useInstallationCertificate } from '../api/get-installation-certificate';
import { InstallationParticularsForm, problemsByField } from './installation-particulars';

/**
 * Which certificate the job's signed work needs, shown as the office is about to issue one: the one asked for, or a
 * warning that the server will refuse it and why. For the installation certificate, the circuits it schedules, what
 * the records still lack, and the particulars to fill in (starting from the site's records and the signer).
 */
export function CertificateChoice({
  jobId,
  kind,
  particulars,
  onParticulars,
  showProblems,
}: {
  jobId: string;
  kind: CertificateKind;
  particulars: InstallationParticulars | null;
  onParticulars: (p: InstallationParticulars) => void;
  showProblems: boolean;
}) {
  const preview = useInstallationCertificate(jobId);
  const defaults = preview.data?.defaults;
  useEffect(() => {
    if (kind === 'installation-certificate' && defaults && !particulars) onParticulars(defaults);
  }, [kind, defaults, particulars, onParticulars]);
  if (preview.isPending) return <LinearProgress aria-label="Working out which certificate applies" />;
  if (preview.isError) return <Alert severity="error">{preview.error.message}</Alert>;
  const { choice, problems, circuits } = preview.data;
  const fits = choice.kind === kind;
  return (
    <Stack spacing={2} sx={{ mt: 2 }}>
      <Alert severity={fits ? 'info' : 'warning'} aria-label="Which certificate applies">
        <AlertTitle>{fits ? `The ${CERTIFICATE_WORDS[kind].toLowerCase()} is the one for this work` : `This work needs the ${CERTIFICATE_WORDS[choice.kind].toLowerCase()}`}</AlertTitle>
        {choice.sentence}
        {!fits && ` Issuing the ${CERTIFICATE_WORDS[kind].toLowerCase()} will be refused.`}
      </Alert>
      {kind === 'installation-certificate' && fits && (
        <>
          <Typography variant="body2">
            <strong>Schedule of circuits:</strong> {circuits.join('; ') || 'none recorded'}
          </Typography>
          {problems.length > 0 && (
            <Alert severity="warning">
              <AlertTitle>The records still lack</AlertTitle>
              <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
                {problems.map((p) => (
                  <li key={p}>{p}</li>
                ))}
              </Box>
            </Alert>
          )}
          {particulars && <InstallationParticularsForm value={particulars} onChange={onParticulars} problems={showProblems ? problemsByField(particularsProblems(particulars)) : new Map()} />}
        </>
      )}
    </Stack>
  );
}
