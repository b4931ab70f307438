import { zodResolver } from '@hookform/resolvers/zod';
import Accordion from '@mui/material/Accordion';
import AccordionDetails from '@mui/material/AccordionDetails';
import AccordionSummary from '@mui/material/AccordionSummary';
import Button from '@mui/material/Button';
import Checkbox from '@mui/material/Checkbox';
import FormControlLabel from '@mui/material/FormControlLabel';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import ExpandMore from '@mui/icons-material/ExpandMore';
import { useEffect, useMemo, useRef, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { circuitKindWords } from '@wiretrail/core';
import { DraftNotice } from '@/components/forms/draft-notice';
import { startingValues, useFormDraft } from '@/components/forms/form-draft';
import type { BoardRow, CircuitRow } from '@/lib/db';
import { saveRecord } from '@/lib/sync/local-write';
import {
  CertificateDetailFields,
  certificateOffers,
  type CircuitDetails,
  CircuitDetailFields,
  circuitDetailFields,
  circuitDetailsOf,
  checkCircuitDetails,
  circuitDetailsSchema,
  FAULT_PROTECTION_WORDS,
} from './circuit-fields';

export function describeCircuit(c: CircuitRow): string {
  return [
    c.kind ? circuitKindWords(c.kind) : null,
    c.deviceType ? `${/^[BCD]$/.test(c.deviceType) ? `type ${c.deviceType}` : c.deviceType} ${c.deviceRatingA ?? '?'}\u00a0A` : 'device not recorded',
    c.rcdRatingMa ? `${c.rcdRatingMa} mA RCD${c.rcdType ? ` (${c.rcdType})` : ''}` : 'no RCD recorded',
    c.liveCsaMm2 && c.cpcCsaMm2 ? `${c.liveCsaMm2}/${c.cpcCsaMm2}\u00a0mm²` : 'sizes not recorded',
    c.faultProtection ? `fault protection ${FAULT_PROTECTION_WORDS[c.faultProtection]?.split(' (')[0]?.toLowerCase()}` : 'fault protection not recorded',
    c.newOnVisitId ? 'new circuit' : null,
  ]
    .filter(Boolean)
    .join(' · ');
}

type Offered = keyof ReturnType<typeof certificateOffers>;
const OFFERED: readonly Offered[] = ['deviceStandard', 'rcdStandard', 'rcdRatedCurrentA', 'maxDisconnectionS'];

/**
 * The circuit's details, folded away once known; the verdicts depend on them, so they can be put right here, and the
 * certificate states the rest. Where the certificate's details are not recorded, the standard values are offered and
 * follow the device, the RCD and the site's earthing until the technician types their own.
 */
export function CircuitDetailsForm({
  circuit,
  board,
  visitId,
  locked,
  earthing,
}: {
  circuit: CircuitRow;
  board?: BoardRow;
  visitId: string;
  locked: boolean;
  earthing?: string | null;
}) {
  const incomplete = !circuit.deviceType || circuit.deviceRatingA == null || circuit.liveCsaMm2 == null || circuit.cpcCsaMm2 == null || !circuit.faultProtection;
  const draftKey = locked ? null : `circuit.${circuit.id}`;
  const recorded = circuitDetailsOf(circuit, visitId, earthing);
  const [note, setNote] = useState('');
  const { register, handleSubmit, formState, control, setValue, getValues, reset } = useForm<CircuitDetails>({
    resolver: zodResolver(circuitDetailsSchema.superRefine(checkCircuitDetails)),
    defaultValues: startingValues(draftKey, recorded),
  });
  const draft = useFormDraft(draftKey, useWatch({ control }) as CircuitDetails, recorded, reset);
  const [open, setOpen] = useState(incomplete || draft.restored);
  const [kind, deviceType, deviceRatingA, rcdRatingMa, rcdType, rcdStandard, deviceStandard, rcdRatedCurrentA, maxDisconnectionS] = useWatch({
    control,
    name: ['kind', 'deviceType', 'deviceRatingA', 'rcdRatingMa', 'rcdType', 'rcdStandard', 'deviceStandard', 'rcdRatedCurrentA', 'maxDisconnectionS'],
  });
  const offers = useMemo(
    () => certificateOffers({ kind, deviceType, deviceRatingA, rcdRatingMa, rcdType, rcdStandard }, earthing),
    [kind, deviceType, deviceRatingA, rcdRatingMa, rcdType, rcdStandard, earthing],
  );
  // An offer follows what it is offered from until the technician types over it.
  const lastOffers = useRef(offers);
  useEffect(() => {
    for (const field of OFFERED) {
      const now = getValues(field);
      if (offers[field] !== lastOffers.current[field] && (now === '' || now === lastOffers.current[field])) setValue(field, offers[field]);
    }
    lastOffers.current = offers;
  }, [offers, getValues, setValue]);
  const current: Record<Offered, string> = { deviceStandard, rcdStandard, rcdRatedCurrentA, maxDisconnectionS };
  const offered = new Set<keyof CircuitDetails>(OFFERED.filter((f) => circuit[f] == null && current[f] !== '' && current[f] === offers[f]));
  async function markBoard(replaced: boolean) {
    if (!board) return;
    try {
      await saveRecord('board', board.id, { replacedOnVisitId: replaced ? visitId : null });
      setNote(replaced ? `${board.name} recorded as replaced on this visit.` : `${board.name} no longer recorded as replaced.`);
    } catch (err) {
      setNote((err as Error).message);
    }
  }
  async function save(v: CircuitDetails) {
    try {
      await saveRecord('circuit', circuit.id, circuitDetailFields(v, visitId, circuit));
      draft.settle();
      setNote('Circuit details saved on this phone.');
      setOpen(false);
    } catch (err) {
      setNote((err as Error).message);
    }
  }
  return (
    <Accordion expanded={open} onChange={(_, o) => setOpen(o)} variant="outlined" disableGutters>
      <AccordionSummary expandIcon={<ExpandMore />} aria-controls="circuit-details" id="circuit-details-header">
        <Stack>
          <Typography sx={{ fontWeight: 500 }}>Circuit details</Typography>
          <Typography variant="body2" color="text.secondary">
            {describeCircuit(circuit)}
          </Typography>
        </Stack>
      </AccordionSummary>
      <AccordionDetails id="circuit-details">
        <Stack component="form" aria-label="Circuit details" noValidate onSubmit={handleSubmit(save)} spacing={1.5}>
          <fieldset disabled={locked} style={{ border: 0, padding: 0, margin: 0, minWidth: 0, display: 'grid', gap: 12 }}>
            <DraftNotice draft={draft} />
            <CircuitDetailFields register={register} control={control} errors={formState.errors} />
            {board && (
              <FormControlLabel
                control={<Checkbox checked={board.replacedOnVisitId === visitId} onChange={(e) => void markBoard(e.target.checked)} />}
                label={`${board.name} was replaced on this visit (a consumer unit replacement needs an electrical installation certificate)`}
              />
            )}
            <Typography variant="body2" color="text.secondary">
              For the certificate
            </Typography>
            <CertificateDetailFields register={register} control={control} errors={formState.errors} values={{ deviceStandard, rcdStandard, rcdRatingMa }} offered={offered} />
            {!locked && (
              <Button type="submit" variant="outlined" size="large">
                Save circuit details
              </Button>
            )}
          </fieldset>
        </Stack>
      </AccordionDetails>
      {note && (
        <Typography variant="body2" role="status" sx={{ px: 2, pb: 1.5 }}>
          {note}
        </Typography>
      )}
    </Accordion>
  );
}
