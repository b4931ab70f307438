import Autocomplete from '@mui/material/Autocomplete';
import TextField, { type TextFieldProps } from '@mui/material/TextField';

export type OfferedValuesInputProps = {
  label: string;
  value: string;
  onChange: (value: string) => void;
  onBlur?: () => void;
  /** The standard values, in the order to offer them. */
  options: readonly string[];
  error?: boolean;
  helperText?: TextFieldProps['helperText'];
  inputMode?: 'decimal' | 'numeric' | 'text';
  sx?: TextFieldProps['sx'];
  name?: string;
  disabled?: boolean;
  /** A form's ref, so that a refused value is focused. */
  ref?: React.Ref<HTMLInputElement>;
};

/**
 * A text input that offers the standard values as a list and still takes what is typed: the trade meets devices and
 * cables the list does not hold, and the checks, not the input, say what cannot be so.
 */
export function OfferedValuesInput({ label, value, onChange, onBlur, options, error, helperText, inputMode, sx, name, disabled, ref }: OfferedValuesInputProps) {
  return (
    <Autocomplete
      freeSolo
      autoHighlight={false}
      // The list opens as the field is tapped; no small arrow or clear buttons for a gloved thumb to miss.
      openOnFocus
      forcePopupIcon={false}
      disableClearable
      options={options as string[]}
      value={value}
      inputValue={value}
      onInputChange={(_, typed) => onChange(typed)}
      onChange={(_, chosen) => onChange(chosen)}
      onBlur={onBlur}
      disabled={disabled}
      sx={sx}
      renderInput={(params) => (
        <TextField {...params} inputRef={ref} name={name} label={label} error={error} helperText={helperText} slotProps={{ ...params.slotProps, htmlInput: { ...params.slotProps.htmlInput, inputMode } }} />
      )}
    />
  );
}
