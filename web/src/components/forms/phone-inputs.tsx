import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import TextField, { type TextFieldProps } from '@mui/material/TextField';
import { forwardRef } from 'react';

/**
 * A choice as the phone's own picker (a native select): large, familiar, and usable with a glove. Spread a
 * react-hook-form `register(...)` or a Controller's `field` into it.
 */
export const NativeChoice = forwardRef<HTMLDivElement, Omit<TextFieldProps, 'select' | 'children'> & { options: readonly { value: string; label: string }[]; emptyLabel?: string }>(
  function NativeChoice({ options, emptyLabel, slotProps, ...rest }, ref) {
    return (
      <TextField select ref={ref} {...rest} slotProps={{ ...slotProps, select: { native: true }, inputLabel: { shrink: true } }}>
        {emptyLabel !== undefined && <option value="">{emptyLabel}</option>}
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </TextField>
    );
  },
);

/** Choices from a list of values and the words for each. */
export const choicesOf = (values: readonly string[], words: Record<string, string>) => values.map((value) => ({ value, label: words[value] ?? value }));

/** The end of a phone form: what went wrong saving it, and the save button unless the visit is locked. */
export function SaveBar({ error, locked, label }: { error: string | null; locked: boolean; label: string }) {
  return (
    <>
      {error && (
        <Alert severity="error" role="alert">
          {error}
        </Alert>
      )}
      {!locked && (
        <Button type="submit" variant="contained" size="large">
          {label}
        </Button>
      )}
    </>
  );
}
