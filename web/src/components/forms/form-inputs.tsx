import MenuItem from '@mui/material/MenuItem';
import TextField, { type TextFieldProps } from '@mui/material/TextField';
import { Controller, type FieldValues, get, type Path, type UseFormReturn } from 'react-hook-form';
import { OfferedValuesInput } from './offered-values-input';

// The inputs hold text; what the schema turns it into on submit is the form's business, hence the open output type.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Form<T extends FieldValues> = UseFormReturn<T, unknown, any>;

type InputProps<T extends FieldValues> = { form: Form<T>; name: Path<T>; label: string; hint?: string } & Omit<TextFieldProps, 'name' | 'label' | 'form'>;

function errorOf<T extends FieldValues>(form: Form<T>, name: Path<T>): string | undefined {
  return (get(form.formState.errors, name) as { message?: string } | undefined)?.message;
}

/** A text input bound to a form field, showing the field's error in place of its hint. */
export function FormTextInput<T extends FieldValues>({ form, name, label, hint, ...rest }: InputProps<T>) {
  const error = errorOf(form, name);
  return <TextField label={label} {...form.register(name)} error={!!error} helperText={error ?? hint} {...rest} />;
}

/** A choice bound to a form field; `emptyLabel` offers "none", which the schema turns into null. */
export function FormSelectInput<T extends FieldValues>({
  form,
  name,
  label,
  hint,
  options,
  emptyLabel,
  ...rest
}: InputProps<T> & { options: readonly { value: string; label: string }[]; emptyLabel?: string }) {
  const error = errorOf(form, name);
  return (
    <Controller
      control={form.control}
      name={name}
      render={({ field }) => (
        <TextField select label={label} {...field} error={!!error} helperText={error ?? hint} {...rest}>
          {emptyLabel !== undefined && (
            <MenuItem value="">
              <em>{emptyLabel}</em>
            </MenuItem>
          )}
          {options.map((o) => (
            <MenuItem key={o.value} value={o.value}>
              {o.label}
            </MenuItem>
          ))}
        </TextField>
      )}
    />
  );
}

/** A text input bound to a form field that offers the standard values and still takes what is typed. */
export function FormOfferedInput<T extends FieldValues>({
  form,
  name,
  label,
  hint,
  options,
  inputMode,
  sx,
}: { form: Form<T>; name: Path<T>; label: string; hint?: string; options: readonly string[]; inputMode?: 'decimal' | 'text'; sx?: TextFieldProps['sx'] }) {
  const error = errorOf(form, name);
  return (
    <Controller
      control={form.control}
      name={name}
      render={({ field }) => <OfferedValuesInput label={label} {...field} value={field.value ?? ''} options={options} error={!!error} helperText={error ?? hint} inputMode={inputMode} sx={sx} />}
    />
  );
}
