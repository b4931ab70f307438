import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { ROLES } from '@wiretrail/core';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { z } from 'zod';
import { serverFieldErrors } from '@/lib/server-field-errors';
import { useCreatePerson } from '../api/manage-users';

const schema = z.object({
  name: z.string().trim().min(1, 'Enter their name.'),
  email: z.string().trim().min(1, 'Enter their e-mail address.').email('That is not an e-mail address.'),
  role: z.enum(ROLES, { message: 'Choose a role.' }),
});
type Values = z.infer<typeof schema>;
const LABELS: Record<keyof Values, string> = { name: 'Name', email: 'E-mail', role: 'Role' };

export function AddPersonDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const create = useCreatePerson();
  const { register, control, handleSubmit, formState, reset, setError } = useForm<Values>({
    resolver: zodResolver(schema),
    defaultValues: { name: '', email: '', role: 'technician' },
  });
  const [refusal, setRefusal] = useState<string[]>([]);
  const close = () => {
    setRefusal([]);
    reset();
    create.reset();
    onClose();
  };
  return (
    <Dialog open={open} onClose={close} fullWidth maxWidth="xs" aria-labelledby="add-person-title">
      <DialogTitle id="add-person-title">Add a person</DialogTitle>
      <DialogContent>
        <Stack component="form" id="add-person-form" noValidate spacing={2} sx={{ pt: 1 }} onSubmit={handleSubmit((v) => {
            setRefusal([]);
            create.mutate(v, {
              onSuccess: close,
              // The server's refusal goes beside the field it is about; only what names no field goes above the form.
              onError: (err) => {
                const { byField, rest } = serverFieldErrors(err, LABELS, { email: /e-mail already/i });
                for (const [field, message] of Object.entries(byField) as [keyof Values, string][]) setError(field, { message }, { shouldFocus: true });
                setRefusal(rest);
              },
            });
          })}
        >
          {refusal.length > 0 && (
            <Alert severity="error" role="alert">
              Not added: {refusal.join(' ')}
            </Alert>
          )}
          <TextField label="Name" {...register('name')} error={!!formState.errors.name} helperText={formState.errors.name?.message} />
          <TextField label="E-mail" type="email" {...register('email')} error={!!formState.errors.email} helperText={formState.errors.email?.message} />
          <Controller
            control={control}
            name="role"
            render={({ field }) => (
              <TextField select label="Role" {...field} error={!!formState.errors.role} helperText={formState.errors.role?.message}>
                <MenuItem value="technician">Technician</MenuItem>
                <MenuItem value="office">Office</MenuItem>
                <MenuItem value="admin">Admin</MenuItem>
              </TextField>
            )}
          />
          <Typography variant="body2" color="text.secondary">
            We e-mail them: a link to set their own password, or, if they already sign in to Wiretrail for another
            contractor, a note to sign in as they do and choose you.
          </Typography>
        </Stack>
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2 }}>
        <Button onClick={close}>Cancel</Button>
        <Button type="submit" form="add-person-form" variant="contained" disabled={create.isPending}>
          Add person
        </Button>
      </DialogActions>
    </Dialog>
  );
}
