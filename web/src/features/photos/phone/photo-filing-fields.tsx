import Box from '@mui/material/Box';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { PHOTO_SUBJECTS } from '@wiretrail/core';
import type { PhotoSubjectType } from '@/lib/photos/add-photo';
import type { CaptureChoices } from '../data/get-capture-choices';

/** Where a photo is filed: an area, what it shows (`type:id`, or '' for nothing in particular), and its tags. */
export interface PhotoFiling {
  areaId: string;
  subject: string;
  tags: string[];
}

export const NO_SUBJECT = '';

interface Props {
  filing: PhotoFiling;
  onChange: (filing: PhotoFiling) => void;
  choices: CaptureChoices | undefined;
  tagChoices: string[];
  /** Added to each label when one form files several photos: "Area of photo 2". */
  of?: string;
  areaHelp?: string;
  disabled?: boolean;
}

/** Area, subject and tags of one photo (or of all the photos chosen together), as the phone offers them. */
export function PhotoFilingFields({ filing, onChange, choices, tagChoices, of, areaHelp = ' ', disabled }: Props) {
  const label = (word: string) => (of ? `${word} of ${of}` : word);
  const toggle = (tag: string) => onChange({ ...filing, tags: filing.tags.includes(tag) ? filing.tags.filter((t) => t !== tag) : [...filing.tags, tag] });
  // A tag the office has since taken off its list still shows on the photo that carries it.
  const offered = [...tagChoices, ...filing.tags.filter((t) => !tagChoices.includes(t))];
  return (
    <Stack spacing={2}>
      <TextField
        select
        label={label('Area')}
        value={filing.areaId}
        onChange={(e) => onChange({ ...filing, areaId: e.target.value })}
        disabled={disabled}
        slotProps={{ select: { native: true }, inputLabel: { shrink: true } }}
        helperText={areaHelp}
      >
        <option value="">Not given</option>
        {choices?.areas.map((a) => (
          <option key={a.id} value={a.id}>
            {a.name}
          </option>
        ))}
      </TextField>
      <TextField
        select
        label={label('Shows')}
        value={filing.subject}
        onChange={(e) => onChange({ ...filing, subject: e.target.value })}
        disabled={disabled}
        slotProps={{ select: { native: true }, inputLabel: { shrink: true } }}
        helperText="A circuit, cable run or point change, if the photo is of one."
      >
        <option value={NO_SUBJECT}>Nothing in particular</option>
        {choices?.subjects.map((s) => (
          <option key={`${s.type}:${s.id}`} value={`${s.type}:${s.id}`}>
            {s.label}
          </option>
        ))}
      </TextField>
      <Box component="fieldset" sx={{ border: 0, p: 0, m: 0 }} disabled={disabled}>
        <Typography component="legend" variant="body2" color="text.secondary" sx={{ mb: 1 }}>
          {label('Tags')}
        </Typography>
        <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }}>
          {offered.map((tag) => {
            const on = filing.tags.includes(tag);
            return (
              <Chip
                key={tag}
                label={tag}
                color={on ? 'primary' : 'default'}
                variant={on ? 'filled' : 'outlined'}
                onClick={disabled ? undefined : () => toggle(tag)}
                aria-pressed={on}
                aria-disabled={disabled || undefined}
                role="button"
                sx={{ minHeight: 44, fontSize: '0.95rem', borderRadius: 6 }}
              />
            );
          })}
        </Stack>
      </Box>
    </Stack>
  );
}

/** The subject field's value split into what the photo row keeps. */
export function subjectOf(subject: string): { subjectType: PhotoSubjectType | null; subjectId: string | null } {
  const at = subject.indexOf(':');
  const subjectType = PHOTO_SUBJECTS.find((t) => t === subject.slice(0, at)) ?? null;
  return subjectType && at > 0 ? { subjectType, subjectId: subject.slice(at + 1) } : { subjectType: null, subjectId: null };
}

/** The subject field's value for a photo row. */
export const subjectValue = (row: { subjectType?: string | null; subjectId?: string | null }): string =>
  row.subjectType && row.subjectId ? `${row.subjectType}:${row.subjectId}` : NO_SUBJECT;
