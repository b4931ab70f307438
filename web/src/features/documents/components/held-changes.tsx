import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Button from '@mui/material/Button';
import Checkbox from '@mui/material/Checkbox';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormGroup from '@mui/material/FormGroup';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useMemo, useState } from 'react';
import { ApiError } from '@/lib/api-client';
import { type HeldChange, useHeldChanges } from '../api/get-held-changes';
import { useReviseDocument } from '../api/revise-document';
import { heldFieldName, heldValue } from '../document-words';

/**
 * What the job's issued documents keep back: each change beside the value as issued, so the job page never shows a
 * value that contradicts the PDF. A change is made only by revising the document that holds it.
 */
export function HeldChanges({ jobId }: { jobId: string }) {
  const held = useHeldChanges(jobId);
  const [revising, setRevising] = useState<{ documentId: string; number: string } | null>(null);
  const byDocument = useMemo(() => {
    const groups = new Map<string, { number: string; changes: HeldChange[] }>();
    for (const h of held.data?.items ?? []) {
      const group = groups.get(h.documentId) ?? { number: h.number, changes: [] };
      group.changes.push(h);
      groups.set(h.documentId, group);
    }
    return [...groups.entries()];
  }, [held.data]);
  if (!byDocument.length) return null;
  return (
    <Stack component="section" aria-labelledby="held-changes-heading" spacing={1.5}>
      <Alert severity="warning">
        <AlertTitle id="held-changes-heading">Changes waiting behind issued documents</AlertTitle>
        These records are printed on an issued document, so they show the values as issued. Each change made since waits beside its issued value;
        to make it, revise the document (it gets a new number and the old one stays, marked superseded).
      </Alert>
      {byDocument.map(([documentId, { number, changes }]) => (
        <TableContainer key={documentId} component={Paper} variant="outlined">
          <Stack direction="row" sx={{ justifyContent: 'space-between', alignItems: 'center', px: 2, pt: 1.5 }}>
            <Typography variant="h3">Held by {number}</Typography>
            <Button variant="outlined" onClick={() => setRevising({ documentId, number })}>
              Revise {number}
            </Button>
          </Stack>
          <Table aria-label={`Changes held by ${number}`} size="small">
            <TableHead>
              <TableRow>
                <TableCell>Record</TableCell>
                <TableCell>What</TableCell>
                <TableCell>As issued</TableCell>
                <TableCell>Changed since</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {changes.map((c) => (
                <TableRow key={c.conflictId}>
                  <TableCell>{c.record}</TableCell>
                  <TableCell>{heldFieldName(c.field)}</TableCell>
                  <TableCell sx={{ fontWeight: 500 }}>{heldValue(c.issuedValue)}</TableCell>
                  <TableCell>{heldValue(c.pendingValue)}</TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </TableContainer>
      ))}
      {revising && (
        <ReviseDialog
          jobId={jobId}
          documentId={revising.documentId}
          number={revising.number}
          changes={byDocument.find(([id]) => id === revising.documentId)?.[1].changes ?? []}
          onClose={() => setRevising(null)}
        />
      )}
    </Stack>
  );
}

function ReviseDialog({ jobId, documentId, number, changes, onClose }: { jobId: string; documentId: string; number: string; changes: HeldChange[]; onClose: () => void }) {
  const revise = useReviseDocument(jobId);
  const [reason, setReason] = useState('');
  const [take, setTake] = useState<Set<string>>(() => new Set(changes.map((c) => c.conflictId)));
  const [issued, setIssued] = useState<string | null>(null);
  const refusal = revise.error instanceof ApiError ? revise.error.messages : revise.error ? [revise.error.message] : [];
  const toggle = (id: string) =>
    setTake((now) => {
      const next = new Set(now);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });
  return (
    <Dialog open onClose={onClose} aria-labelledby="revise-document-title" fullWidth maxWidth="sm">
      <DialogTitle id="revise-document-title">Revise {number}</DialogTitle>
      <DialogContent>
        {issued ? (
          <Alert severity="success">{issued} issued. {number} stays on record, marked superseded.</Alert>
        ) : (
          <Stack spacing={2}>
            <DialogContentText>
              The revision gets a new number and names {number} and why. The changes you tick are made first; the records are judged again, and
              the revision is refused if they would not support it.
            </DialogContentText>
            <TextField label="Why it is revised" value={reason} onChange={(e) => setReason(e.target.value)} multiline minRows={2} required />
            <FormGroup aria-label="Changes to take">
              {changes.map((c) => (
                <FormControlLabel
                  key={c.conflictId}
                  control={<Checkbox checked={take.has(c.conflictId)} onChange={() => toggle(c.conflictId)} />}
                  label={`${c.record}, ${heldFieldName(c.field)}: ${heldValue(c.issuedValue)} → ${heldValue(c.pendingValue)}`}
                />
              ))}
            </FormGroup>
            {refusal.length > 0 && (
              <Alert severity="warning">
                <AlertTitle>The revision was not issued</AlertTitle>
                {refusal.join(' ')}
              </Alert>
            )}
          </Stack>
        )}
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2 }}>
        <Button onClick={onClose}>{issued ? 'Close' : 'Cancel'}</Button>
        {!issued && (
          <Button
            variant="contained"
            disabled={!reason.trim() || revise.isPending}
            onClick={() => revise.mutate({ documentId, reason: reason.trim(), take: [...take] }, { onSuccess: (doc) => setIssued(doc.number) })}
          >
            Issue the revision
          </Button>
        )}
      </DialogActions>
    </Dialog>
  );
}
