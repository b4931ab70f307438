// @vitest-environment happy-dom
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { getSession, setSession } from '@/lib/session';
import { SignInForm } from '../components/sign-in-form';

function renderForm(onSignedIn = vi.fn()) {
  render(<SignInForm onSignedIn={onSignedIn} />);
  return onSignedIn;
}

describe('SignInForm', () => {
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
    setSession(null);
  });

  it('names each empty field instead of sending the form', async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal('fetch', fetchMock);
    renderForm();
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter your e-mail address.')).toBeTruthy();
    expect(screen.getByText('Enter your password.')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('refuses an address that is not one, and sends a good one without its spaces', async () => {
    const fetchMock = vi.fn(async () => new Response(JSON.stringify({ statusCode: 401, message: 'No.' }), { status: 401 }));
    vi.stubGlobal('fetch', fetchMock);
    renderForm();
    fireEvent.input(screen.getByLabelText('E-mail'), { target: { value: 'office@' } });
    fireEvent.input(screen.getByLabelText('Password'), { target: { value: 'wiretrail-demo' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('That is not an e-mail address.')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
    fireEvent.input(screen.getByLabelText('E-mail'), { target: { value: ' office@larkfield.example ' } });
    await waitFor(() => expect(screen.queryByText('That is not an e-mail address.')).toBeNull());
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    await waitFor(() => expect(fetchMock).toHaveBeenCalledTimes(1));
    const [, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(JSON.parse(init.body as string)).toEqual({ email: 'office@larkfield.example', password: 'wiretrail-demo' });
  });

  it("shows the server's refusal in plain words", async () => {
    vi.stubGlobal('fetch', vi.fn(async () => new Response(JSON.stringify({ statusCode: 401, message: 'That e-mail and password do not match an active account.' }), { status: 401 })));
    renderForm();
    fireEvent.input(screen.getByLabelText('E-mail'), { target: { value: 'office@larkfield.example' } });
    fireEvent.input(screen.getByLabelText('Password'), { target: { value: 'wrong' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('That e-mail and password do not match an active account.')).toBeTruthy();
    expect(getSession()).toBeNull();
  });

  it('stores the session and reports it on success', async () => {
    const session = { accessToken: 'a', refreshToken: 'r', user: { id: 'u', email: 'office@larkfield.example', name: 'Dan Whitlow', role: 'office', organisationId: 'o' } };
    vi.stubGlobal('fetch', vi.fn(async () => new Response(JSON.stringify(session), { status: 200 })));
    const onSignedIn = renderForm();
    fireEvent.input(screen.getByLabelText('E-mail'), { target: { value: 'office@larkfield.example' } });
    fireEvent.input(screen.getByLabelText('Password'), { target: { value: 'wiretrail-demo' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    await waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(session));
    expect(getSession()?.user.role).toBe('office');
  });
});
