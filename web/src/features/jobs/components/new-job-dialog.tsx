import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { FormSelectInput, FormTextInput } from '@/components/forms/form-inputs';
import { RecordDialog } from '@/components/forms/record-dialog';
import { optionalEmail, optionalPhone, optionalPostcode, optionalText, requiredText } from '@/lib/record-schema';
import { type NewJob, useCreateJob, useCustomerChoices } from '../api/create-job';
import type { Job } from '../api/get-jobs';

const NEW = 'new';

const schema = z
  .object({
    customerId: z.string(),
    customerName: z.string().trim().max(200, 'Name must be at most 200 characters.'),
    customerPhone: optionalPhone('customer', 'phone', 'Phone'),
    customerEmail: optionalEmail('customer', 'email', 'E-mail'),
    siteId: z.string(),
    siteAddress: z.string().trim().max(500, 'Address must be at most 500 characters.'),
    sitePostcode: optionalPostcode('site', 'postcode', 'Postcode'),
    siteAccessNotes: optionalText('site', 'accessNotes', 'Access notes'),
    title: requiredText('job', 'title', 'What the job is'),
    description: optionalText('job', 'description', 'Details'),
  })
  .superRefine((v, ctx) => {
    if (v.customerId === '') ctx.addIssue({ code: 'custom', path: ['customerId'], message: 'Choose who the job is for, or take a new customer.' });
    if (v.customerId === NEW && v.customerName === '') ctx.addIssue({ code: 'custom', path: ['customerName'], message: 'Give the new customer’s name.' });
    if (v.siteId === '' && v.customerId !== NEW) ctx.addIssue({ code: 'custom', path: ['siteId'], message: 'Choose where the work is, or take a new site.' });
    if ((v.siteId === NEW || v.customerId === NEW) && v.siteAddress === '') ctx.addIssue({ code: 'custom', path: ['siteAddress'], message: 'Give the address where the work is.' });
  });
type Values = z.input<typeof schema>;

/**
 * A new enquiry: who it is for and where, each picked or taken down there and then, and what the job is. It starts
 * in Enquiry with the next reference in the organisation's series.
 */
export function NewJobDialog({ customerId = '', siteId = '', onClose, onCreated }: { customerId?: string; siteId?: string; onClose: () => void; onCreated: (job: Job) => void }) {
  const customers = useCustomerChoices();
  const create = useCreateJob();
  const form = useForm<Values, unknown, z.output<typeof schema>>({
    resolver: zodResolver(schema),
    defaultValues: { customerId, customerName: '', customerPhone: '', customerEmail: '', siteId, siteAddress: '', sitePostcode: '', siteAccessNotes: '', title: '', description: '' },
  });
  const chosenCustomer = useWatch({ control: form.control, name: 'customerId' });
  const chosenSite = useWatch({ control: form.control, name: 'siteId' });
  const newCustomer = chosenCustomer === NEW;
  const sites = customers.data?.items.find((c) => c.id === chosenCustomer)?.sites ?? [];
  const newSite = newCustomer || chosenSite === NEW;

  const submit = form.handleSubmit((v) => {
    const job: NewJob = {
      customer: v.customerId === NEW ? { name: v.customerName, phone: v.customerPhone, email: v.customerEmail } : { id: v.customerId },
      site: newSite ? { address: v.siteAddress, postcode: v.sitePostcode, accessNotes: v.siteAccessNotes } : { id: v.siteId },
      title: v.title,
      description: v.description,
    };
    create.mutate(job, { onSuccess: onCreated });
  });

  return (
    <RecordDialog open title="New job" submitLabel="Take the job" onSubmit={submit} onClose={onClose} pending={create.isPending} error={create.error}>
      <FormSelectInput
        form={form}
        name="customerId"
        label="Customer"
        emptyLabel="Choose a customer"
        options={[...(customers.data?.items ?? []).map((c) => ({ value: c.id, label: c.name })), { value: NEW, label: 'A new customer…' }]}
        onChange={(e) => {
          form.setValue('customerId', e.target.value, { shouldValidate: form.formState.isSubmitted });
          // The sites offered are the customer's own.
          form.setValue('siteId', '');
        }}
        autoFocus
      />
      {newCustomer && (
        <Stack spacing={2} component="fieldset" sx={{ border: 0, p: 0, m: 0 }}>
          <Typography component="legend" variant="subtitle2">
            The new customer
          </Typography>
          <FormTextInput form={form} name="customerName" label="Name" />
          <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
            <FormTextInput form={form} name="customerPhone" label="Phone" type="tel" />
            <FormTextInput form={form} name="customerEmail" label="E-mail" type="email" />
          </Stack>
        </Stack>
      )}
      {chosenCustomer && !newCustomer && (
        <FormSelectInput
          form={form}
          name="siteId"
          label="Site"
          emptyLabel={sites.length ? 'Choose a site' : 'No sites yet'}
          options={[...sites.map((s) => ({ value: s.id, label: s.name })), { value: NEW, label: 'A new site…' }]}
        />
      )}
      {newSite && (
        <Stack spacing={2} component="fieldset" sx={{ border: 0, p: 0, m: 0 }}>
          <Typography component="legend" variant="subtitle2">
            Where the work is
          </Typography>
          <FormTextInput form={form} name="siteAddress" label="Address" multiline minRows={2} />
          <FormTextInput form={form} name="sitePostcode" label="Postcode" sx={{ maxWidth: 200 }} />
          <FormTextInput form={form} name="siteAccessNotes" label="Access notes" hint="Keys, parking, pets: what the technician needs to know." multiline />
        </Stack>
      )}
      <FormTextInput form={form} name="title" label="What the job is" hint="As the customer would recognise it, like “Outside socket for the garden office”." />
      <FormTextInput form={form} name="description" label="Details" multiline minRows={2} />
    </RecordDialog>
  );
}
