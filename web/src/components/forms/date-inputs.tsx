import type { SxProps, Theme } from '@mui/material/styles';
import { AdapterDayjs } from '@mui/x-date-pickers/AdapterDayjs';
import { DatePicker } from '@mui/x-date-pickers/DatePicker';
import { LocalizationProvider } from '@mui/x-date-pickers/LocalizationProvider';
import { TimePicker } from '@mui/x-date-pickers/TimePicker';
import dayjs, { type Dayjs } from 'dayjs';
import 'dayjs/locale/en-gb';
import type { ReactNode } from 'react';

interface Props {
  label: string;
  /** As the API and the forms keep it: 2026-03-14 for a date, 09:30 for a time; '' for none. */
  value: string;
  onChange: (value: string) => void;
  onBlur?: () => void;
  error?: boolean;
  helperText?: ReactNode;
  size?: 'small' | 'medium';
  sx?: SxProps<Theme>;
  name?: string;
  disabled?: boolean;
}

const DAY = 'YYYY-MM-DD';
// The calendar and clock buttons are tapped with a thumb, on the phone's sign-off too: 44 px each way (WCAG 2.5.5).
const BUTTON = { sx: { minWidth: 44, minHeight: 44 } };
const TIME = 'HH:mm';

// Each input brings its own provider, so screens without a date (Today among them) never load the pickers.
const InGb = ({ children }: { children: ReactNode }) => (
  <LocalizationProvider dateAdapter={AdapterDayjs} adapterLocale="en-gb">
    {children}
  </LocalizationProvider>
);

/** What the picker holds, as the form keeps it: a half-typed or impossible date is '' and the form says so. */
const textOf = (d: Dayjs | null, format: string) => (d && d.isValid() ? d.format(format) : '');

/** A date typed and read as 14/03/2026 (en-GB) that the form keeps as 2026-03-14, with a calendar beside it. */
export function DateInput({ label, value, onChange, onBlur, error, helperText, size, sx, name, disabled, min, max }: Props & { min?: string; max?: string }) {
  return (
    <InGb>
      <DatePicker
        label={label}
        value={value ? dayjs(value) : null}
        onChange={(d) => onChange(textOf(d, DAY))}
        minDate={min ? dayjs(min) : undefined}
        maxDate={max ? dayjs(max) : undefined}
        disabled={disabled}
        sx={sx}
        slotProps={{ textField: { name, size, error, helperText, onBlur }, openPickerButton: BUTTON }}
      />
    </InGb>
  );
}

/** A time typed and read on the 24-hour clock (09:30), as the trade writes it. */
export function TimeInput({ label, value, onChange, onBlur, error, helperText, size, sx, name, disabled }: Props) {
  return (
    <InGb>
      <TimePicker
        label={label}
        ampm={false}
        value={value ? dayjs(`2000-01-01T${value}`) : null}
        onChange={(d) => onChange(textOf(d, TIME))}
        disabled={disabled}
        sx={sx}
        slotProps={{ textField: { name, size, error, helperText, onBlur }, openPickerButton: BUTTON }}
      />
    </InGb>
  );
}
