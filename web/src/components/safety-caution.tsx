import Alert from '@mui/material/Alert';

/** Shown wherever a screen leads to work on a circuit. */
export function SafetyCaution() {
  return (
    <Alert severity="warning" variant="outlined" sx={{ mb: 2 }}>
      Before working on a circuit: isolate it safely, lock off and prove dead with an approved voltage indicator, and work only
      within your competence. Wiretrail keeps the record; the wiring regulations in force, local codes and a competent person decide.
    </Alert>
  );
}
