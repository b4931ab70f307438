import { z } from 'zod';
import { FormTextInput } from '@/components/forms/form-inputs';
import { RecordDialog } from '@/components/forms/record-dialog';
import { useRecordForm } from '@/components/forms/use-record-form';
import { optionalEmail, optionalPhone, optionalText, requiredText, startingTexts } from '@/lib/record-schema';
import type { Customer } from '../../api/get-customers';
import { useSaveCustomer } from '../../api/save-record';

export const customerSchema = z.object({
  name: requiredText('customer', 'name', 'Name'),
  email: optionalEmail('customer', 'email', 'E-mail'),
  phone: optionalPhone('customer', 'phone', 'Phone'),
  address: optionalText('customer', 'address', 'Billing address'),
  notes: optionalText('customer', 'notes', 'Notes'),
});

/** Adds a customer, or changes one's details; `onSaved`, when given, takes over from closing. */
export function CustomerDialog({ customer, onClose, onSaved }: { customer?: Customer; onClose: () => void; onSaved?: (c: Customer) => void }) {
  const save = useSaveCustomer();
  const { form, submit } = useRecordForm(customerSchema, startingTexts(customerSchema, customer), {
    isNew: !customer,
    onUnchanged: onClose,
    onChanges: (changes) => save.mutate({ id: customer?.id, values: changes }, { onSuccess: (saved) => (onSaved ? onSaved(saved) : onClose()) }),
  });
  return (
    <RecordDialog open title={customer ? `Change ${customer.name}` : 'Add a customer'} submitLabel={customer ? 'Save changes' : 'Add customer'} onSubmit={submit} onClose={onClose} pending={save.isPending} error={save.error}>
      <FormTextInput form={form} name="name" label="Name" autoFocus />
      <FormTextInput form={form} name="email" label="E-mail" type="email" />
      <FormTextInput form={form} name="phone" label="Phone" type="tel" />
      <FormTextInput form={form} name="address" label="Billing address" multiline minRows={2} />
      <FormTextInput form={form} name="notes" label="Notes" hint="For the office: billing, preferences." multiline minRows={2} />
    </RecordDialog>
  );
}
