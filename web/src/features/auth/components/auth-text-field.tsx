import FormControl from '@mui/material/FormControl';
import FormHelperText from '@mui/material/FormHelperText';
import InputLabel from '@mui/material/InputLabel';
import OutlinedInput, { type OutlinedInputProps } from '@mui/material/OutlinedInput';
import { useId } from 'react';

type Props = Omit<OutlinedInputProps, 'label' | 'fullWidth'> & { label: string; helperText?: string };

/**
 * An outlined text field made of the parts MUI's TextField is made of, and looking the same. TextField brings its
 * select with it (a menu, a popover, a modal), which signing in never opens: on the way to every first screen that
 * is some 20 KB gzipped less to download.
 */
export function AuthTextField({ label, helperText, error, ...input }: Props) {
  const id = useId();
  const helperTextId = helperText ? `${id}-helper-text` : undefined;
  return (
    <FormControl variant="outlined" fullWidth error={error}>
      <InputLabel htmlFor={id} id={`${id}-label`}>
        {label}
      </InputLabel>
      <OutlinedInput id={id} label={label} aria-describedby={helperTextId} {...input} />
      {helperText && <FormHelperText id={helperTextId}>{helperText}</FormHelperText>}
    </FormControl>
  );
}
