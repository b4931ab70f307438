import { zodResolver } from '@hookform/resolvers/zod';
import { type FieldValues, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { fieldsToSend } from '@/lib/record-schema';

interface Options<Out> {
  /** A new record sends every field given; a recorded one only those the user touched. */
  isNew: boolean;
  onChanges: (changes: Partial<Out>) => void;
  /** Submitted with nothing touched: there is nothing to ask the server. */
  onUnchanged: () => void;
}

/**
 * A record's form: react-hook-form checked by the zod schema, and a submit that hands on what to send. A field
 * someone else changed meanwhile (on a phone, say) is not overwritten with the value the form was opened with.
 */
export function useRecordForm<In extends FieldValues, Out extends Record<string, unknown>>(schema: z.ZodType<Out, In>, defaultValues: In, { isNew, onChanges, onUnchanged }: Options<Out>) {
  const form = useForm<In, unknown, Out>({ resolver: zodResolver(schema), defaultValues: defaultValues as never });
  // Read while rendering: react-hook-form keeps track of touched fields only for form state read here.
  const { dirtyFields } = form.formState;
  const submit = form.handleSubmit((values) => {
    const changes = fieldsToSend(values, dirtyFields as Partial<Record<keyof Out, unknown>>, isNew);
    if (!isNew && Object.keys(changes).length === 0) return onUnchanged();
    onChanges(changes);
  });
  return { form, submit };
}
