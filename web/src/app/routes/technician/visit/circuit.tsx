import ArrowBack from '@mui/icons-material/ArrowBack';
import ElectricalServicesOutlined from '@mui/icons-material/ElectricalServicesOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { paths } from '@/config/paths';
import { useCircuitTests } from '@/features/circuits/data/get-circuit-tests';
import { CircuitDetailsForm } from '@/features/circuits/phone/circuit-details-form';
import { ReadingsForm } from '@/features/circuits/phone/readings-form';
import { CautionGate } from '@/features/visits/phone/caution-gate';
import { useVisitContext } from '../visit-context';

export function Component() {
  const { summary, locked } = useVisitContext();
  const { visit } = summary;
  const { circuitId = '' } = useParams();
  const data = useCircuitTests(visit.id, visit.siteId);
  const [saved, setSaved] = useState(false);
  if (!data) return null;
  const circuit = [...data.boards.flatMap((b) => b.circuits), ...data.loose].find((c) => c.id === circuitId);
  const back = paths.visitCircuits.href(visit.id);
  return (
    <CautionGate visit={visit} locked={locked}>
      <Button component={RouterLink} to={back} startIcon={<ArrowBack />} sx={{ ml: -1.5, mb: 1 }}>
        All circuits
      </Button>
      {!circuit ? (
        <EmptyState icon={<ElectricalServicesOutlined />} title="This circuit is not on this phone">
          It may belong to another site.
        </EmptyState>
      ) : (
        <Stack spacing={2}>
          <Typography variant="h2">
            Circuit {circuit.number}
            {circuit.description ? ` · ${circuit.description}` : ''}
          </Typography>
          <CircuitDetailsForm
            key={`${circuit.id}-${circuit._base.version}`}
            circuit={circuit}
            board={data.boards.find((b) => b.circuits.some((c) => c.id === circuit.id))?.board}
            visitId={visit.id}
            locked={locked}
          />
          {saved && (
            <Alert severity="success" role="status" onClose={() => setSaved(false)}>
              Readings saved on this phone.
            </Alert>
          )}
          <ReadingsForm
            key={circuit.id}
            visitId={visit.id}
            siteId={visit.siteId}
            circuit={circuit}
            result={data.results.get(circuit.id)}
            earthing={data.site?.earthing}
            extensions={data.altered.get(circuit.id) ?? []}
            locked={locked}
            onSaved={() => {
              setSaved(true);
              window.scrollTo({ top: 0, behavior: 'smooth' });
            }}
          />
        </Stack>
      )}
    </CautionGate>
  );
}
