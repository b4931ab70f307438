import DescriptionOutlined from '@mui/icons-material/DescriptionOutlined';
import DownloadOutlined from '@mui/icons-material/DownloadOutlined';
import ForwardToInboxOutlined from '@mui/icons-material/ForwardToInboxOutlined';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import FormControlLabel from '@mui/material/FormControlLabel';
import LinearProgress from '@mui/material/LinearProgress';
import Paper from '@mui/material/Paper';
import Radio from '@mui/material/Radio';
import RadioGroup from '@mui/material/RadioGroup';
import Snackbar from '@mui/material/Snackbar';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { type InstallationParticulars, particularsProblems, VERDICT_DISCLAIMER } from '@wiretrail/core';
import { useCallback, useState } from 'react';
import { VisuallyHidden } from '@/components/visually-hidden';
import { ApiError } from '@/lib/api-client';
import { useDownloadDocument } from '../api/download-document';
import { type DocumentCoverage, type DocumentKind, type JobDocument, useJobDocuments } from '../api/get-job-documents';
import { useJobRecipient } from '../api/get-job-recipient';
import { useIssueDocument } from '../api/issue-document';
import { COVERAGES, DOCUMENT_KINDS, documentName, issuedTime, kindName } from '../document-words';
import { CertificateChoice } from './certificate-choice';
import { EmailStateChip } from './email-state-chip';
import { SendDocumentDialog } from './send-document-dialog';

/** A job's documents for the office: issue each kind, see what was issued and how its e-mail went, download, send. */
export function JobDocuments({ jobId }: { jobId: string }) {
  const documents = useJobDocuments(jobId);
  const issue = useIssueDocument(jobId);
  const download = useDownloadDocument();
  const recipient = useJobRecipient(jobId);
  const [confirming, setConfirming] = useState<DocumentKind | null>(null);
  const [refused, setRefused] = useState<{ kind: DocumentKind; messages: string[] } | null>(null);
  const [sending, setSending] = useState<JobDocument | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [coverage, setCoverage] = useState<DocumentCoverage>('job');
  // An installation certificate's particulars, as the office fills them in on the issue dialog.
  const [particulars, setParticulars] = useState<InstallationParticulars | null>(null);
  const [showProblems, setShowProblems] = useState(false);
  const onParticulars = useCallback((p: InstallationParticulars) => setParticulars(p), []);
  // What the office should know of a document just issued: each cable that fails, by name.
  const [issuedNotices, setIssuedNotices] = useState<{ number: string; notices: string[] } | null>(null);

  const start = (kind: DocumentKind) => {
    if (kind === 'installation-certificate' && (!particulars || particularsProblems(particulars).length)) {
      setShowProblems(true);
      return;
    }
    setConfirming(null);
    setRefused(null);
    setIssuedNotices(null);
    issue.mutate(
      { kind, coverage, ...(kind === 'installation-certificate' && particulars ? { particulars } : {}) },
      {
        onSuccess: (doc) => {
          setNotice(`${doc.number} issued.`);
          setParticulars(null);
          setShowProblems(false);
          if (doc.notices?.length) setIssuedNotices({ number: doc.number, notices: doc.notices });
        },
        onError: (err) => setRefused({ kind, messages: err instanceof ApiError ? err.messages : [err.message] }),
      },
    );
  };
  const items = documents.data?.items ?? [];
  const numberOf = (id: string | null) => items.find((d) => d.id === id)?.number ?? 'another document';

  return (
    <Stack component="section" aria-labelledby="documents-heading" spacing={2}>
      <Stack direction="row" sx={{ alignItems: 'baseline', gap: 2 }}>
        <Typography variant="h2" id="documents-heading">
          Documents
        </Typography>
        {documents.data && <Typography color="text.secondary">{items.length === 1 ? '1 issued' : `${items.length} issued`}</Typography>}
      </Stack>

      <Paper variant="outlined" sx={{ p: 2 }}>
        <Box role="group" aria-label="Issue a document" sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', md: 'repeat(2, minmax(0, 1fr))', lg: 'repeat(4, minmax(0, 1fr))' } }}>
          {DOCUMENT_KINDS.map((k) => (
            <Stack key={k.kind} spacing={0.75} sx={{ alignItems: 'flex-start' }}>
              <Button variant="outlined" startIcon={<DescriptionOutlined />} disabled={issue.isPending} onClick={() => setConfirming(k.kind)}>
                {k.issue}
              </Button>
              <Typography variant="body2" color="text.secondary">
                {k.about}
              </Typography>
            </Stack>
          ))}
        </Box>
        <Typography variant="caption" color="text.secondary" component="p" sx={{ mt: 2 }}>
          {VERDICT_DISCLAIMER}
        </Typography>
      </Paper>
      {issue.isPending && <LinearProgress aria-label="Issuing the document" />}

      {refused && (
        <Alert severity="warning" onClose={() => setRefused(null)}>
          <AlertTitle>The {kindName(refused.kind).toLowerCase()} was not issued</AlertTitle>
          {refused.messages.length === 1 ? (
            refused.messages[0]
          ) : (
            <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
              {refused.messages.map((m) => (
                <li key={m}>{m}</li>
              ))}
            </Box>
          )}
        </Alert>
      )}
      {issuedNotices && (
        <Alert severity="warning" onClose={() => setIssuedNotices(null)}>
          <AlertTitle>{issuedNotices.number} records a fault</AlertTitle>
          <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
            {issuedNotices.notices.map((m) => (
              <li key={m}>{m}</li>
            ))}
          </Box>
        </Alert>
      )}
      {documents.isError && <Alert severity="error">{documents.error.message}</Alert>}
      {download.isError && (
        <Alert severity="error" onClose={() => download.reset()}>
          {download.error.message}
        </Alert>
      )}

      {documents.isPending ? (
        <LinearProgress aria-label="Loading documents" />
      ) : items.length === 0 ? (
        <Typography color="text.secondary">No documents issued for this job yet.</Typography>
      ) : (
        <TableContainer component={Paper} variant="outlined">
          <Table aria-label="Issued documents">
            <TableHead>
              <TableRow>
                <TableCell>Number</TableCell>
                <TableCell>Document</TableCell>
                <TableCell>Issued</TableCell>
                <TableCell>E-mail</TableCell>
                <TableCell align="right">
                  <VisuallyHidden>Actions</VisuallyHidden>
                </TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {items.map((d) => (
                <TableRow key={d.id}>
                  <TableCell sx={{ fontWeight: 500, whiteSpace: 'nowrap' }}>
                    {d.number}
                    {d.supersededAt && (
                      <Typography variant="body2" color="warning.main">
                        Superseded by {numberOf(d.supersededById)}
                      </Typography>
                    )}
                  </TableCell>
                  <TableCell>
                    {documentName(d)}
                    {d.supersedesId && (
                      <Typography variant="body2" color="text.secondary">
                        Revision of {numberOf(d.supersedesId)}: {d.revisionReason}
                      </Typography>
                    )}
                    {d.signerName && (
                      <Typography variant="body2" color="text.secondary">
                        {d.kind === 'minor-works' || d.kind === 'installation-certificate' ? `Signed by ${d.signerName}` : `Issued by ${d.signerName}`}
                      </Typography>
                    )}
                  </TableCell>
                  <TableCell sx={{ whiteSpace: 'nowrap' }}>{issuedTime(d.issuedAt)}</TableCell>
                  <TableCell>
                    <EmailStateChip doc={d} />
                  </TableCell>
                  <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
                    <Stack direction="row" spacing={1} sx={{ justifyContent: 'flex-end' }}>
                      <Button startIcon={<DownloadOutlined />} onClick={() => download.mutate(d)} aria-label={`Download ${d.number}`}>
                        PDF
                      </Button>
                      <Button startIcon={<ForwardToInboxOutlined />} onClick={() => setSending(d)} aria-label={`E-mail ${d.number} to the customer`}>
                        E-mail
                      </Button>
                    </Stack>
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </TableContainer>
      )}

      <Dialog
        open={!!confirming}
        onClose={() => setConfirming(null)}
        aria-labelledby="issue-document-title"
        maxWidth={confirming === 'installation-certificate' ? 'md' : 'sm'}
        fullWidth={confirming === 'installation-certificate'}
      >
        <DialogTitle id="issue-document-title">{confirming && `Issue the ${kindName(confirming).toLowerCase()}?`}</DialogTitle>
        <DialogContent>
          <DialogContentText>
            It gets the next number and cannot be changed afterwards. Every record it prints locks, the site’s earthing, boards and circuits
            included: any later change waits beside the issued value for review, and a correction is a revision with a new number.
          </DialogContentText>
          {(confirming === 'minor-works' || confirming === 'installation-certificate') && (
            <CertificateChoice jobId={jobId} kind={confirming} particulars={particulars} onParticulars={onParticulars} showProblems={showProblems} />
          )}
          {confirming === 'cabling-report' && (
            <RadioGroup aria-label="Cables to report" value={coverage} onChange={(_, v) => setCoverage(v as DocumentCoverage)} sx={{ mt: 2 }}>
              {COVERAGES.map((c) => (
                <FormControlLabel
                  key={c.value}
                  value={c.value}
                  control={<Radio />}
                  label={
                    <>
                      {c.label}
                      <Typography variant="body2" color="text.secondary">
                        {c.about}
                      </Typography>
                    </>
                  }
                />
              ))}
            </RadioGroup>
          )}
        </DialogContent>
        <DialogActions sx={{ px: 3, pb: 2 }}>
          {confirming === 'installation-certificate' && showProblems && particulars && particularsProblems(particulars).length > 0 && (
            <Typography role="status" color="error" variant="body2" sx={{ mr: 'auto' }}>
              {particularsProblems(particulars).length === 1 ? '1 particular to complete, marked above.' : `${particularsProblems(particulars).length} particulars to complete, marked above.`}
            </Typography>
          )}
          <Button onClick={() => setConfirming(null)}>Cancel</Button>
          <Button variant="contained" onClick={() => confirming && start(confirming)}>
            Issue
          </Button>
        </DialogActions>
      </Dialog>

      <SendDocumentDialog
        jobId={jobId}
        doc={sending}
        others={items}
        defaultTo={recipient.email}
        customerName={recipient.name}
        onClose={() => setSending(null)}
        onSent={(to) => setNotice(`Queued for ${to}. The state below follows it.`)}
      />
      <Snackbar open={!!notice} autoHideDuration={5000} onClose={() => setNotice(null)} message={notice} />
    </Stack>
  );
}
