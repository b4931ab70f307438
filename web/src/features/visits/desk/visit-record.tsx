import Box from '@mui/material/Box';
import Chip from '@mui/material/Chip';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { VOIDED_SX } from '@/components/records/voided-mark';
import type { VisitRecord } from '../api/get-visit-record';
import { visitStatusWords, whenSigned } from '../visit-format';
import type { TimelineEntry } from './visit-timeline';

const time = new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit' });
const at = (iso: string | null | undefined) => (iso ? whenSigned(iso) : '—');

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <Box>
      <Typography variant="body2" color="text.secondary">
        {label}
      </Typography>
      <Typography component="div">{children}</Typography>
    </Box>
  );
}

function Words({ label, text }: { label: string; text: string | null | undefined }) {
  return (
    <Box>
      <Typography sx={{ fontWeight: 500 }}>{label}</Typography>
      <Typography sx={{ whiteSpace: 'pre-wrap' }} color={text?.trim() ? 'text.primary' : 'text.secondary'}>
        {text?.trim() || 'None recorded.'}
      </Typography>
    </Box>
  );
}

/** Who went, when they were there, and how far the visit got. */
export function VisitFacts({ record }: { record: VisitRecord }) {
  const { visit } = record;
  return (
    <Paper variant="outlined" component="section" aria-label="The visit" sx={{ p: 2, display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr 1fr', md: 'repeat(5, minmax(0, 1fr))' } }}>
      <Fact label="Status">
        <Chip size="small" variant="outlined" label={visitStatusWords(visit.status)} />
      </Fact>
      <Fact label="Technicians">{record.technicians.map((p) => p.name).join(', ') || 'Nobody yet'}</Fact>
      <Fact label="Planned">{visit.plannedStart ? `${at(visit.plannedStart)}${visit.plannedEnd ? `–${time.format(new Date(visit.plannedEnd))}` : ''}` : 'Not yet arranged'}</Fact>
      <Fact label="Arrived">{at(visit.actualStart)}</Fact>
      <Fact label="Left">{at(visit.actualEnd)}</Fact>
      <Fact label="Cautions read">{at(visit.cautionsReadAt)}</Fact>
      <Fact label="Signed off">{visit.signedAt ? `${visit.signedByName ?? 'Signed'}${visit.signedByPosition ? `, ${visit.signedByPosition}` : ''}, ${at(visit.signedAt)}` : 'Not yet'}</Fact>
    </Paper>
  );
}

/** The technician's sign-off as written on the phone: the work, what was seen, departures, and the signature drawn. */
export function VisitSignOff({ record }: { record: VisitRecord }) {
  const { visit } = record;
  const departures = visit.departureEntries ?? [];
  return (
    <Paper variant="outlined" component="section" aria-labelledby="visit-sign-off-heading" sx={{ p: 2 }}>
      <Stack spacing={2}>
        <Typography variant="h2" id="visit-sign-off-heading">
          Sign-off
        </Typography>
        <Words label="Work done and its extent" text={visit.workDescription} />
        <Words label="Observations" text={visit.observations} />
        <Box>
          <Typography sx={{ fontWeight: 500 }}>Departures from the standard</Typography>
          {departures.length === 0 && !visit.departures?.trim() ? (
            <Typography color="text.secondary">None recorded.</Typography>
          ) : (
            <Box component="ol" aria-label="Departures" sx={{ pl: 3, my: 0.5 }}>
              {departures.map((d, i) => (
                <li key={i}>
                  <Typography>
                    <strong>Reg {d.regulation}:</strong> {d.instead} <em>Why no less safe:</em> {d.noLessSafe}
                  </Typography>
                </li>
              ))}
              {/* Written before departures were structured: shown as it was, and it waives nothing. */}
              {visit.departures?.trim() && (
                <li>
                  <Typography sx={{ whiteSpace: 'pre-wrap' }}>{visit.departures}</Typography>
                </li>
              )}
            </Box>
          )}
        </Box>
        <Words label="Comments on the existing installation" text={visit.existingInstallationComments} />
        <Words label="Permitted exceptions" text={visit.permittedExceptions ? `${visit.permittedExceptions}${visit.riskAssessmentRef ? ` (risk assessment ${visit.riskAssessmentRef})` : ''}` : null} />
        <Box>
          <Typography sx={{ fontWeight: 500 }}>Signature</Typography>
          {visit.signatureSvg ? (
            // As an image, so nothing in the stored drawing can run on the office's page.
            <Box
              component="img"
              src={`data:image/svg+xml;charset=utf-8,${encodeURIComponent(visit.signatureSvg)}`}
              alt={`Signature of ${visit.signedByName ?? 'the signer'}`}
              sx={{ display: 'block', maxWidth: 360, width: '100%', height: 'auto', bgcolor: '#fff', border: 1, borderColor: 'divider', borderRadius: 1, mt: 0.5 }}
            />
          ) : (
            <Typography color="text.secondary">Not signed yet.</Typography>
          )}
        </Box>
      </Stack>
    </Paper>
  );
}

/** Parts the technician used, as recorded on the phone; prices are the office's, on the invoice. */
export function VisitParts({ record }: { record: VisitRecord }) {
  return (
    <Paper variant="outlined" component="section" aria-labelledby="visit-parts-heading" sx={{ p: 2 }}>
      <Typography variant="h2" id="visit-parts-heading" sx={{ mb: 1 }}>
        Parts used
      </Typography>
      {record.parts.length === 0 ? (
        <Typography color="text.secondary">No parts recorded on this visit.</Typography>
      ) : (
        <Table size="small" aria-labelledby="visit-parts-heading">
          <TableHead>
            <TableRow>
              <TableCell>Part</TableCell>
              <TableCell align="right">Quantity</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {record.parts.map((p) => (
              <TableRow key={p.id}>
                <TableCell>{p.description}</TableCell>
                <TableCell align="right">
                  {p.quantity} {p.unit ?? ''}
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
    </Paper>
  );
}

/** Everything in the order it happened on site. */
export function VisitTimeline({ entries }: { entries: TimelineEntry[] }) {
  return (
    <Paper variant="outlined" component="section" aria-labelledby="visit-timeline-heading" sx={{ p: 2 }}>
      <Typography variant="h2" id="visit-timeline-heading" sx={{ mb: 1 }}>
        In the order it happened
      </Typography>
      {entries.length === 0 ? (
        <Typography color="text.secondary">Nothing recorded on this visit yet.</Typography>
      ) : (
        <Box component="ol" aria-label="What was recorded, in time order" sx={{ listStyle: 'none', p: 0, m: 0 }}>
          {entries.map((e) => (
            <Box component="li" key={e.id} aria-label={e.voided ? `${e.title} (void)` : e.title} sx={{ display: 'flex', gap: 2, py: 1.25, borderTop: 1, borderColor: 'divider', '&:first-of-type': { borderTop: 0 } }}>
              <Typography variant="body2" color="text.secondary" sx={{ width: 48, flexShrink: 0, fontVariantNumeric: 'tabular-nums', pt: 0.25 }}>
                {e.at ? time.format(new Date(e.at)) : '—'}
              </Typography>
              {e.media}
              <Box sx={{ minWidth: 0 }}>
                <Typography sx={{ fontWeight: 500, ...(e.voided ? VOIDED_SX : {}) }}>{e.title}</Typography>
                {e.detail && <Typography sx={{ whiteSpace: 'pre-wrap', overflowWrap: 'anywhere', ...(e.voided ? VOIDED_SX : {}) }}>{e.detail}</Typography>}
                {e.voided && (
                  <Typography color="error" sx={{ fontWeight: 500, overflowWrap: 'anywhere' }}>
                    {e.voided}
                  </Typography>
                )}
                {e.by && (
                  <Typography variant="body2" color="text.secondary">
                    {e.by}
                  </Typography>
                )}
              </Box>
            </Box>
          ))}
        </Box>
      )}
    </Paper>
  );
}
