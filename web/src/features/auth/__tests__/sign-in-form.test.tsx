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

  it('asks someone who works for several organisations to choose, then signs in to the one chosen', async () => {
    const choice = { chooseOrganisation: [{ id: 'org-l', name: 'Larkfield Electrical & Data' }, { id: 'org-o', name: 'Oakmere Power & Data' }] };
    const session = {
      accessToken: 'a', refreshToken: 'r',
      user: { id: 'u-o', email: 'corin@valewiring.example', name: 'Corin Vale', role: 'technician', organisationId: 'org-o', organisationName: 'Oakmere Power & Data' },
      organisations: choice.chooseOrganisation,
    };
    const fetchMock = vi.fn(async (_url: string, init: RequestInit) =>
      new Response(JSON.stringify(JSON.parse(init.body as string).organisationId ? session : choice), { status: 200 }));
    vi.stubGlobal('fetch', fetchMock);
    const onSignedIn = renderForm();
    fireEvent.input(screen.getByLabelText('E-mail'), { target: { value: 'corin@valewiring.example' } });
    fireEvent.input(screen.getByLabelText('Password'), { target: { value: 'wiretrail-demo' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    const group = await screen.findByRole('group', { name: /more than one organisation/ });
    expect(group).toBeTruthy();
    // No session until the choice is made.
    expect(getSession()).toBeNull();
    expect(onSignedIn).not.toHaveBeenCalled();
    fireEvent.click(screen.getByRole('button', { name: 'Oakmere Power & Data' }));
    await waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(session));
    const [, second] = fetchMock.mock.calls[1] as unknown as [string, RequestInit];
    expect(JSON.parse(second.body as string)).toEqual({ email: 'corin@valewiring.example', password: 'wiretrail-demo', organisationId: 'org-o' });
    expect(getSession()?.user.organisationName).toBe('Oakmere Power & Data');
  });

  it('goes back to the form, without the password, to sign in as someone else', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => new Response(JSON.stringify({ chooseOrganisation: [{ id: 'a', name: 'A' }, { id: 'b', name: 'B' }] }), { status: 200 })));
    renderForm();
    fireEvent.input(screen.getByLabelText('E-mail'), { target: { value: 'corin@valewiring.example' } });
    fireEvent.input(screen.getByLabelText('Password'), { target: { value: 'wiretrail-demo' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    fireEvent.click(await screen.findByRole('button', { name: 'Sign in as someone else' }));
    expect((screen.getByLabelText('Password') as HTMLInputElement).value).toBe('');
    expect((screen.getByLabelText('E-mail') as HTMLInputElement).value).toBe('corin@valewiring.example');
  });
});
