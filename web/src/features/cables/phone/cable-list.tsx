import AddOutlined from '@mui/icons-material/AddOutlined';
import QrCode2Outlined from '@mui/icons-material/QrCode2Outlined';
import Button from '@mui/material/Button';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { assessCableRun, isVoided, judgeLinkTest, unvoided, type Verdict, voidWords } from '@wiretrail/core';
import { VOIDED_SX } from '@/components/records/voided-mark';
import { Link as RouterLink } from 'react-router-dom';
import { AidLine, VerdictChip } from '@/components/verdicts/verdict-chip';
import { paths } from '@/config/paths';
import type { CableRunRow } from '@/lib/db';
import { useSiteCables } from '../data/get-site-cables';
import { useSiteLinkTests } from '../data/get-link-tests';
import { CABLE_STATUS_WORDS, MEDIUM_WORDS } from '../cable-words';
import { readWiremap } from './wiremap-entry';

export function endWords(cable: CableRunRow, e: 'A' | 'B', areaNames: Map<string, string>): string {
  const area = cable[`end${e}AreaId`];
  return [area ? areaNames.get(area) : null, cable[`end${e}Description`]].filter(Boolean).join(', ') || 'not recorded';
}

export function cableVerdict(c: CableRunRow): Verdict | null {
  if (c.wiremap == null && c.lengthM == null) return null;
  return assessCableRun({ medium: c.medium, scheme: c.scheme, wiremap: readWiremap(c.wiremap), lengthM: c.lengthM, linkKind: c.linkKind }).verdict;
}

/** The site's cable runs, each with where its ends are and how its test went; they stay with the site from visit to visit. */
export function CableList({ siteId, visitId, locked }: { siteId: string; visitId: string; locked: boolean }) {
  const data = useSiteCables(siteId);
  const tests = useSiteLinkTests(siteId);
  if (!data) return null;
  const counted = unvoided(data.cables).length;
  return (
    <Stack spacing={1.5} component="section" aria-labelledby="cables-heading">
      <Stack direction="row" sx={{ justifyContent: 'space-between', alignItems: 'center' }}>
        <Typography variant="h2" id="cables-heading">
          Cables on this site
        </Typography>
        <Typography variant="body2" color="text.secondary">
          {counted}
        </Typography>
      </Stack>
      {!locked && (
        <Button component={RouterLink} to={paths.visitCable.href(visitId, 'new')} variant="contained" size="large" startIcon={<AddOutlined />}>
          Record a cable
        </Button>
      )}
      {data.cables.length === 0 ? (
        <Typography color="text.secondary" variant="body2">
          No cable runs recorded for this site yet. Each one you record stays with the site for later visits.
        </Typography>
      ) : (
        <Paper variant="outlined">
          <List aria-label="Cable runs" disablePadding>
            {data.cables.map((c) => {
              // A voided cable stays listed, struck through with its reason, and is judged no more.
              const voided = isVoided(c);
              const verdict = voided ? null : cableVerdict(c);
              const where = `A: ${endWords(c, 'A', data.areaNames)} → B: ${endWords(c, 'B', data.areaNames)} · ${CABLE_STATUS_WORDS[c.status ?? 'unidentified']}`;
              return (
                <ListItem key={c.id} disablePadding divider>
                  <ListItemButton component={RouterLink} to={paths.visitCable.href(visitId, c.id)} sx={{ gap: 1, alignItems: 'flex-start' }}>
                    <ListItemText
                      primary={`${c.label}${c.medium ? ` · ${MEDIUM_WORDS[c.medium] ?? c.medium}` : ''}`}
                      secondary={voided ? `${voidWords(c)} · ${where}` : where}
                      slotProps={voided ? { primary: { sx: VOIDED_SX } } : undefined}
                    />
                    <Stack spacing={0.5} sx={{ alignItems: 'flex-end' }}>
                      {verdict && <VerdictChip verdict={verdict} />}
                      {!voided && tests?.get(c.id) && <VerdictChip verdict={judgeLinkTest(tests.get(c.id)!).verdict} prefix="Performance" />}
                    </Stack>
                  </ListItemButton>
                </ListItem>
              );
            })}
          </List>
        </Paper>
      )}
      {data.cables.length > 0 && <AidLine />}
      {counted > 0 && (
        <Button component={RouterLink} to={paths.cableLabels.href(visitId)} startIcon={<QrCode2Outlined />} variant="outlined" size="large">
          Print labels with QR codes
        </Button>
      )}
    </Stack>
  );
}
