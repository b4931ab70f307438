import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { useForm } from 'react-hook-form';
// The mini build: signing in is on the way to every first screen, and it needs two checks, not all of zod.
import { z } from 'zod/mini';
import { ApiError, OfflineError } from '@/lib/api-client';
import type { Session } from '@/lib/session';
import { useSignIn } from '../api/sign-in';

export const signInSchema = z.object({
  email: z.string().check(z.trim(), z.minLength(1, 'Enter your e-mail address.'), z.email('That is not an e-mail address.')),
  password: z.string().check(z.minLength(1, 'Enter your password.')),
});

type SignInValues = z.infer<typeof signInSchema>;

function explain(error: unknown): string {
  if (error instanceof OfflineError) return 'No connection. Signing in needs signal once; after that the app works without it.';
  if (error instanceof ApiError) return error.messages.join(' ');
  return 'Signing in failed. Please try again.';
}

export function SignInForm({ onSignedIn }: { onSignedIn: (session: Session) => void }) {
  const { register, handleSubmit, formState } = useForm<SignInValues>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: '', password: '' },
  });
  const signIn = useSignIn(onSignedIn);
  return (
    <Stack component="form" noValidate spacing={2.5} onSubmit={handleSubmit((v) => signIn.mutate(v))} aria-label="Sign in">
      {signIn.isError && <Alert severity="error">{explain(signIn.error)}</Alert>}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        inputMode="email"
        autoFocus
        {...register('email')}
        error={!!formState.errors.email}
        helperText={formState.errors.email?.message}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        {...register('password')}
        error={!!formState.errors.password}
        helperText={formState.errors.password?.message}
      />
      <Button type="submit" variant="contained" size="large" disabled={signIn.isPending}>
        {signIn.isPending ? 'Signing in…' : 'Sign in'}
      </Button>
    </Stack>
  );
}
