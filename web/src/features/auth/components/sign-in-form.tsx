import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { type FormEvent, useRef, useState } from 'react';
// Only zod's e-mail pattern: signing in is on the way to every first screen, and two checks need no form library.
import { regexes } from 'zod/v4/core';
import { ApiError, OfflineError } from '@/lib/api-client';
import type { Session } from '@/lib/session';
import { type SignInInput, useSignIn } from '../api/sign-in';
import { AuthTextField } from './auth-text-field';

type Problems = Partial<Record<'email' | 'password', string>>;

/** What is wrong with the form as typed; the e-mail address is checked (and sent) without surrounding spaces. */
export function signInProblems({ email, password }: SignInInput): Problems {
  const problems: Problems = {};
  const address = email.trim();
  if (!address) problems.email = 'Enter your e-mail address.';
  else if (!regexes.email.test(address)) problems.email = 'That is not an e-mail address.';
  if (!password) problems.password = 'Enter your password.';
  return problems;
}

function explain(error: unknown): string {
  if (error instanceof OfflineError) return 'No connection. Signing in needs signal once; after that the app works without it.';
  if (error instanceof ApiError) return error.messages.join(' ');
  return 'Signing in failed. Please try again.';
}

export function SignInForm({ onSignedIn }: { onSignedIn: (session: Session) => void }) {
  const [values, setValues] = useState<SignInInput>({ email: '', password: '' });
  // Checked when sent, then again as the user corrects what was refused.
  const [problems, setProblems] = useState<Problems | null>(null);
  const inputs = { email: useRef<HTMLInputElement>(null), password: useRef<HTMLInputElement>(null) };
  const signIn = useSignIn(onSignedIn);

  function change(field: 'email' | 'password', value: string) {
    const next = { ...values, [field]: value };
    setValues(next);
    if (problems) setProblems(signInProblems(next));
  }

  function send(event: FormEvent) {
    event.preventDefault();
    const found = signInProblems(values);
    setProblems(found);
    const first = (['email', 'password'] as const).find((f) => found[f]);
    if (first) inputs[first].current?.focus();
    else void signIn.submit({ email: values.email.trim(), password: values.password });
  }

  if (signIn.choice) {
    // The password was right; the person works for several organisations and says which one now.
    return (
      <Stack spacing={2} role="group" aria-labelledby="choose-organisation">
        {signIn.isError && <Alert severity="error">{explain(signIn.error)}</Alert>}
        <Typography id="choose-organisation" component="h2" variant="subtitle1">
          You work for more than one organisation. Which one are you working for now?
        </Typography>
        {signIn.choice.map((organisation) => (
          <Button
            key={organisation.id}
            variant="outlined"
            size="large"
            disabled={signIn.isPending}
            onClick={() => void signIn.submit({ email: values.email.trim(), password: values.password, organisationId: organisation.id })}
          >
            {organisation.name}
          </Button>
        ))}
        <Button onClick={() => { setValues({ ...values, password: '' }); signIn.startAgain(); }}>Sign in as someone else</Button>
      </Stack>
    );
  }

  return (
    <Stack component="form" noValidate spacing={2.5} onSubmit={send} aria-label="Sign in">
      {signIn.isError && <Alert severity="error">{explain(signIn.error)}</Alert>}
      <AuthTextField
        label="E-mail"
        type="email"
        name="email"
        autoComplete="username"
        inputProps={{ inputMode: 'email' }}
        autoFocus
        inputRef={inputs.email}
        value={values.email}
        onChange={(e) => change('email', e.target.value)}
        error={!!problems?.email}
        helperText={problems?.email}
      />
      <AuthTextField
        label="Password"
        type="password"
        name="password"
        autoComplete="current-password"
        inputRef={inputs.password}
        value={values.password}
        onChange={(e) => change('password', e.target.value)}
        error={!!problems?.password}
        helperText={problems?.password}
      />
      <Button type="submit" variant="contained" size="large" disabled={signIn.isPending}>
        {signIn.isPending ? 'Signing in…' : 'Sign in'}
      </Button>
    </Stack>
  );
}
