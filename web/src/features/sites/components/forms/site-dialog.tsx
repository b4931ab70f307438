import Stack from '@mui/material/Stack';
import { z } from 'zod';
import { FormSelectInput, FormTextInput } from '@/components/forms/form-inputs';
import { RecordDialog } from '@/components/forms/record-dialog';
import { useRecordForm } from '@/components/forms/use-record-form';
import { choicesOf, optionalChoice, optionalNumber, optionalPostcode, optionalText, requiredId, requiredText, startingTexts } from '@/lib/record-schema';
import type { Customer } from '../../api/get-customers';
import type { Site } from '../../api/get-sites';
import { useSaveSite } from '../../api/save-record';

export const siteSchema = z.object({
  customerId: requiredId('the customer'),
  name: optionalText('site', 'name', 'Site name'),
  address: requiredText('site', 'address', 'Address'),
  postcode: optionalPostcode('site', 'postcode', 'Postcode'),
  earthing: optionalChoice('site', 'earthing', 'Earthing arrangement'),
  zeOhm: optionalNumber('site', 'zeOhm', 'Ze', { unit: 'Ω', example: 0.35 }),
  pfcKa: optionalNumber('site', 'pfcKa', 'Prospective fault current', { unit: 'kA', example: 1.8 }),
  accessNotes: optionalText('site', 'accessNotes', 'Access notes'),
});

const EARTHING = choicesOf('site', 'earthing').map((e) => ({ value: e, label: e }));

/** Adds a site for a customer, or changes a site's address, supply and access notes. */
export function SiteDialog({ site, customerId, customers, onClose }: { site?: Site; customerId?: string; customers: Customer[]; onClose: () => void }) {
  const save = useSaveSite();
  const { form, submit } = useRecordForm(siteSchema, { ...startingTexts(siteSchema, site), customerId: site?.customerId ?? customerId ?? '' }, {
    isNew: !site,
    onUnchanged: onClose,
    onChanges: (changes) => save.mutate({ id: site?.id, values: changes }, { onSuccess: onClose }),
  });
  return (
    <RecordDialog open title={site ? `Change ${site.name ?? site.address}` : 'Add a site'} submitLabel={site ? 'Save changes' : 'Add site'} onSubmit={submit} onClose={onClose} pending={save.isPending} error={save.error}>
      <FormSelectInput form={form} name="customerId" label="Customer" options={customers.map((c) => ({ value: c.id, label: c.name }))} />
      <FormTextInput form={form} name="name" label="Site name" hint="Optional: how the office knows it, such as “Orchard Rise”." />
      <FormTextInput form={form} name="address" label="Address" multiline minRows={2} />
      <FormTextInput form={form} name="postcode" label="Postcode" sx={{ maxWidth: 200 }} />
      {/* The earthing on a line of its own, so that neither its label nor the fault current's is cut short. */}
      <FormSelectInput form={form} name="earthing" label="Earthing arrangement" options={EARTHING} emptyLabel="Not recorded" />
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <FormTextInput form={form} name="zeOhm" label="Ze (Ω)" hint="External earth fault loop impedance" inputMode="decimal" />
        <FormTextInput form={form} name="pfcKa" label="Prospective fault current (kA)" hint="PFC at the origin" inputMode="decimal" />
      </Stack>
      <FormTextInput form={form} name="accessNotes" label="Access notes" hint="Keys, parking, pets, when to arrive: technicians see these on their phones." multiline minRows={2} />
    </RecordDialog>
  );
}
