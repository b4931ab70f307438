import Box from '@mui/material/Box';
import Checkbox from '@mui/material/Checkbox';
import FormControlLabel from '@mui/material/FormControlLabel';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { EARTHING_ARRANGEMENTS, type InstallationParticulars, LIVE_CONDUCTORS, WORK_EXTENT_WORDS, WORK_EXTENTS } from '@wiretrail/core';

type Supply = InstallationParticulars['supply'];
type Origin = InstallationParticulars['origin'];

/** Each problem core finds, by the field it names ("supply.zeOhm: give Ze…"), for the field to show beside it. */
export function problemsByField(problems: readonly string[]): Map<string, string> {
  const out = new Map<string, string>();
  for (const p of problems) {
    const at = p.indexOf(': ');
    if (at > 0) out.set(p.slice(0, at), p.slice(at + 2));
  }
  return out;
}

/** A typed figure as the particulars hold it: blank is not given. */
const figureOf = (text: string): number | null => {
  const n = Number(text.trim().replace(',', '.'));
  return text.trim() === '' || !Number.isFinite(n) ? null : n;
};

function FigureField({ label, value, onChange, error, unit }: { label: string; value: number | null; onChange: (v: number | null) => void; error?: string; unit?: string }) {
  return (
    <TextField
      label={unit ? `${label} (${unit})` : label}
      defaultValue={value === null ? '' : String(value)}
      onChange={(e) => onChange(figureOf(e.target.value))}
      error={!!error}
      helperText={error ?? ' '}
      size="small"
      slotProps={{ htmlInput: { inputMode: 'decimal' } }}
    />
  );
}

function WordsField({ label, value, onChange, error, multiline }: { label: string; value: string; onChange: (v: string) => void; error?: string; multiline?: boolean }) {
  return <TextField label={label} value={value} onChange={(e) => onChange(e.target.value)} error={!!error} helperText={error ?? ' '} size="small" multiline={multiline} minRows={multiline ? 2 : undefined} />;
}

const grid = { display: 'grid', gap: 1.5, gridTemplateColumns: { xs: '1fr', sm: 'repeat(2, minmax(0, 1fr))', md: 'repeat(3, minmax(0, 1fr))' } } as const;

/**
 * What the office fills in on an installation certificate that the phone does not record: the extent of the work,
 * who answers for design, construction and testing, the supply and the origin. It starts from the site's records and
 * the signer; core's particularsProblems judges it here and again on the server.
 */
export function InstallationParticularsForm({ value, onChange, problems }: { value: InstallationParticulars; onChange: (next: InstallationParticulars) => void; problems: ReadonlyMap<string, string> }) {
  const set = <K extends keyof InstallationParticulars>(key: K, v: InstallationParticulars[K]) => onChange({ ...value, [key]: v });
  const supply = <K extends keyof Supply>(key: K, v: Supply[K]) => onChange({ ...value, supply: { ...value.supply, [key]: v } });
  const origin = <K extends keyof Origin>(key: K, v: Origin[K]) => onChange({ ...value, origin: { ...value.origin, [key]: v } });
  const err = (field: string) => problems.get(field);
  return (
    <Stack spacing={2} component="fieldset" sx={{ border: 0, p: 0, m: 0 }}>
      <Typography component="legend" sx={{ fontWeight: 500, mb: 1 }}>
        The work and who answers for it
      </Typography>
      <Box sx={grid}>
        <TextField select label="Extent of the work" value={value.extent} onChange={(e) => set('extent', e.target.value as InstallationParticulars['extent'])} size="small" error={!!err('extent')} helperText={err('extent') ?? ' '}>
          {WORK_EXTENTS.map((x) => (
            <MenuItem key={x} value={x}>
              {WORK_EXTENT_WORDS[x]}
            </MenuItem>
          ))}
        </TextField>
        <FigureField label="Next inspection within" unit="years" value={value.nextInspectionYears} onChange={(v) => set('nextInspectionYears', v ?? 0)} error={err('nextInspectionYears')} />
        <WordsField label="Design by" value={value.designedBy} onChange={(v) => set('designedBy', v)} error={err('designedBy')} />
        <WordsField label="Construction by" value={value.constructedBy} onChange={(v) => set('constructedBy', v)} error={err('constructedBy')} />
        <WordsField label="Inspection and testing by" value={value.inspectedBy} onChange={(v) => set('inspectedBy', v)} error={err('inspectedBy')} />
      </Box>
      <WordsField label="What the certificate covers" value={value.extentWords} onChange={(v) => set('extentWords', v)} error={err('extentWords')} multiline />
      <WordsField label="Comments on the existing installation" value={value.existingInstallationComments} onChange={(v) => set('existingInstallationComments', v)} multiline />

      <Typography sx={{ fontWeight: 500 }}>Supply characteristics and earthing</Typography>
      <Box sx={grid}>
        <TextField select label="System type" value={value.supply.system} onChange={(e) => supply('system', e.target.value as Supply['system'])} size="small" error={!!err('supply.system')} helperText={err('supply.system') ?? ' '}>
          {EARTHING_ARRANGEMENTS.map((x) => (
            <MenuItem key={x} value={x}>
              {x}
            </MenuItem>
          ))}
        </TextField>
        <TextField select label="Live conductors" value={value.supply.liveConductors} onChange={(e) => supply('liveConductors', e.target.value as Supply['liveConductors'])} size="small" helperText=" ">
          {LIVE_CONDUCTORS.map((x) => (
            <MenuItem key={x} value={x}>
              {x}
            </MenuItem>
          ))}
        </TextField>
        <FigureField label="Nominal voltage" unit="V" value={value.supply.nominalVoltageV} onChange={(v) => supply('nominalVoltageV', v ?? 0)} error={err('supply.nominalVoltageV')} />
        <FigureField label="Frequency" unit="Hz" value={value.supply.frequencyHz} onChange={(v) => supply('frequencyHz', v ?? 0)} error={err('supply.frequencyHz')} />
        <FigureField label="Prospective fault current" unit="kA" value={value.supply.pfcKa} onChange={(v) => supply('pfcKa', v)} error={err('supply.pfcKa')} />
        <FigureField label="Ze" unit="Ω" value={value.supply.zeOhm} onChange={(v) => supply('zeOhm', v)} error={err('supply.zeOhm')} />
        <WordsField label="Supply device BS (EN)" value={value.supply.deviceStandard} onChange={(v) => supply('deviceStandard', v)} error={err('supply.deviceStandard')} />
        <WordsField label="Supply device type" value={value.supply.deviceType} onChange={(v) => supply('deviceType', v)} />
        <FigureField label="Supply device rating" unit="A" value={value.supply.deviceRatingA} onChange={(v) => supply('deviceRatingA', v)} error={err('supply.deviceRatingA')} />
      </Box>

      <Typography sx={{ fontWeight: 500 }}>Particulars at the origin</Typography>
      <Box sx={grid}>
        <WordsField label="Main switch BS (EN)" value={value.origin.mainSwitchStandard} onChange={(v) => origin('mainSwitchStandard', v)} error={err('origin.mainSwitchStandard')} />
        <FigureField label="Main switch rating" unit="A" value={value.origin.mainSwitchRatingA} onChange={(v) => origin('mainSwitchRatingA', v)} error={err('origin.mainSwitchRatingA')} />
        <FigureField label="Main switch poles" value={value.origin.mainSwitchPoles} onChange={(v) => origin('mainSwitchPoles', v)} error={err('origin.mainSwitchPoles')} />
        <FigureField label="Main switch RCD, blank if none" unit="mA" value={value.origin.mainSwitchRcdMa} onChange={(v) => origin('mainSwitchRcdMa', v)} error={err('origin.mainSwitchRcdMa')} />
        <FigureField label="Earthing conductor" unit="mm²" value={value.origin.earthingConductorCsaMm2} onChange={(v) => origin('earthingConductorCsaMm2', v)} error={err('origin.earthingConductorCsaMm2')} />
        <FigureField label="Main bonding conductors" unit="mm²" value={value.origin.bondingCsaMm2} onChange={(v) => origin('bondingCsaMm2', v)} error={err('origin.bondingCsaMm2')} />
        {value.supply.system === 'TT' && (
          <>
            <WordsField label="Earth electrode type" value={value.origin.electrodeType} onChange={(v) => origin('electrodeType', v)} error={err('origin.electrodeType')} />
            <FigureField label="Earth electrode resistance" unit="Ω" value={value.origin.electrodeOhm} onChange={(v) => origin('electrodeOhm', v)} error={err('origin.electrodeOhm')} />
          </>
        )}
      </Box>
      <Stack>
        <FormControlLabel
          control={<Checkbox checked={value.origin.earthingConductorContinuity} onChange={(e) => origin('earthingConductorContinuity', e.target.checked)} />}
          label="Earthing conductor continuity verified"
        />
        {err('origin.earthingConductorContinuity') && (
          <Typography variant="caption" color="error">
            {err('origin.earthingConductorContinuity')}
          </Typography>
        )}
        <FormControlLabel control={<Checkbox checked={value.origin.bondingContinuity} onChange={(e) => origin('bondingContinuity', e.target.checked)} />} label="Main bonding continuity verified" />
        {err('origin.bondingContinuity') && (
          <Typography variant="caption" color="error">
            {err('origin.bondingContinuity')}
          </Typography>
        )}
      </Stack>
    </Stack>
  );
}
