import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useMutation } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { apiRequest } from '@/lib/api-client';

const schema = z
  .object({
    password: z.string().min(10, 'Use at least 10 characters.'),
    again: z.string(),
  })
  .refine((v) => v.password === v.again, { path: ['again'], message: 'The two passwords are not the same.' });
type Values = z.infer<typeof schema>;

export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const { register, handleSubmit, formState } = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { password: '', again: '' } });
  const complete = useMutation({
    mutationFn: (password: string) => apiRequest('/auth/password-reset', { method: 'POST', body: { token, password }, anonymous: true }),
    onSuccess: onDone,
  });
  return (
    <Stack component="form" noValidate spacing={2.5} aria-label="Set a new password" onSubmit={handleSubmit((v) => complete.mutate(v.password))}>
      {complete.isError && <Alert severity="error">{complete.error.message}</Alert>}
      <TextField label="New password" type="password" autoComplete="new-password" {...register('password')} error={!!formState.errors.password} helperText={formState.errors.password?.message} />
      <TextField label="New password again" type="password" autoComplete="new-password" {...register('again')} error={!!formState.errors.again} helperText={formState.errors.again?.message} />
      <Button type="submit" variant="contained" size="large" disabled={complete.isPending}>
        Set password
      </Button>
    </Stack>
  );
}
