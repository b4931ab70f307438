// @vitest-environment happy-dom
import { fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { type Nation, notifiableWork, type NotifiableJob } from '@wiretrail/core';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { api } from '@/lib/api-client';
import { NotificationSettings } from '../components/notification-settings';
import { RecordNotificationDialog, notificationSchema } from '../components/record-notification-dialog';
import { dueWords, verdictWords, workWords } from '../notification-words';

afterEach(() => vi.restoreAllMocks());

const job = (over: Partial<NotifiableJob> = {}): NotifiableJob => {
  const { caution: _c, ...verdict } = notifiableWork('england', { newCircuits: 1, boardReplaced: false }, '2026-11-01');
  return {
    jobId: '01900000-0000-7000-8000-000000000001', reference: 'LED-0050', title: 'Shower radial', customerName: 'A. Customer', siteName: 'Home',
    newCircuits: 1, boardReplaced: false, completedOn: '2026-11-01', verdict, state: 'to-notify', overdue: true,
    schemeRef: null, notifiedOn: null, certificateReceivedOn: null, ...over,
  };
};

describe('the words of notifiable work', () => {
  it('says what was done, why it is notifiable and the last day, 30 days after completion (reg 20, from memory)', () => {
    const j = job();
    expect(workWords(j)).toBe('1 new circuit');
    expect(workWords({ newCircuits: 2, boardReplaced: true })).toBe('2 new circuits, consumer unit replaced');
    expect(verdictWords(j)).toBe('A new circuit was installed');
    expect(dueWords(j)).toBe('1 Dec 2026');
    expect(dueWords(job({ completedOn: null, verdict: { ...j.verdict, dueBy: null } }))).toBe('When the work is finished');
  });

  it('names a nation that is not covered instead of judging it', () => {
    const { caution: _c, ...verdict } = notifiableWork('scotland', { newCircuits: 1, boardReplaced: false }, '2026-11-01');
    expect(verdictWords(job({ verdict }))).toBe('Not covered in Scotland: check locally');
  });
});

describe('recording a notification', () => {
  it('asks for the scheme reference and a day not yet to come and not before the work was finished', () => {
    const schema = notificationSchema('2026-12-05', '2026-11-01');
    const messages = (v: object) => schema.safeParse({ state: 'notified', schemeRef: '', notifiedOn: '', certificateReceivedOn: '', ...v }).error?.issues.map((i) => i.message) ?? [];
    expect(messages({})).toEqual(['Scheme reference: give the reference the scheme gave.', 'Notified on: give the day.']);
    expect(messages({ schemeRef: 'NT-1', notifiedOn: '2026-12-06' })).toEqual(['Notified on: cannot be later than today.']);
    expect(messages({ schemeRef: 'NT-1', notifiedOn: '2026-10-30' })).toEqual(['Notified on: cannot be before the work was finished.']);
    expect(messages({ schemeRef: 'NT-1', notifiedOn: '2026-12-01', state: 'certificate-received', certificateReceivedOn: '2026-11-20' })).toEqual([
      'Certificate received on: cannot be before it was notified.',
    ]);
    expect(messages({ state: 'to-notify' })).toEqual([]);
  });

  it('sends the state, the reference and the day once the form is right', async () => {
    const patch = vi.spyOn(api, 'patch').mockResolvedValue(job({ state: 'notified' }));
    const onClose = vi.fn();
    render(
      <QueryClientProvider client={new QueryClient()}>
        <RecordNotificationDialog job={job()} onClose={onClose} today="2026-12-05" />
      </QueryClientProvider>,
    );
    const form = await screen.findByRole('form', { name: 'Notification of LED-0050 · Shower radial' });
    fireEvent.click(within(form).getByRole('button', { name: 'Save' }));
    expect(await within(form).findByText('Scheme reference: give the reference the scheme gave.')).toBeTruthy();
    fireEvent.change(within(form).getByLabelText('Scheme reference'), { target: { value: 'NT-884213' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(patch).toHaveBeenCalledWith('/notifiable-work/01900000-0000-7000-8000-000000000001', { state: 'notified', schemeRef: 'NT-884213', notifiedOn: '2026-12-05' }));
    await waitFor(() => expect(onClose).toHaveBeenCalled());
  });

  it('clears a scheme emptied by the admin, and refuses a name over 100 characters', async () => {
    const patch = vi.spyOn(api, 'patch').mockResolvedValue({});
    const form = await showSettings('wales', 'Example Scheme');
    const field = within(form).getByLabelText('Competent person scheme');
    fireEvent.change(field, { target: { value: 'x'.repeat(101) } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save' }));
    expect(await within(form).findByText('Scheme: at most 100 characters.')).toBeTruthy();
    expect(patch).not.toHaveBeenCalled();
    fireEvent.change(field, { target: { value: '  ' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(patch).toHaveBeenCalledWith('/organisations/org-1', { nation: 'wales', competentPersonScheme: null }));
  });
});

async function showSettings(nation: Nation, scheme: string | null, onClose = vi.fn()): Promise<HTMLElement> {
  render(
    <QueryClientProvider client={new QueryClient()}>
      <NotificationSettings organisationId="org-1" nation={nation} scheme={scheme} onClose={onClose} />
    </QueryClientProvider>,
  );
  return screen.findByRole('form', { name: 'Rules and scheme' });
}

describe('the rules and scheme', () => {
  it('lets an admin choose Wales and name the scheme, sent as the organisation’s settings', async () => {
    const patch = vi.spyOn(api, 'patch').mockResolvedValue({});
    const onClose = vi.fn();
    const form = await showSettings('england', null, onClose);
    fireEvent.change(within(form).getByLabelText('Where the contractor works'), { target: { value: 'wales' } });
    fireEvent.change(within(form).getByLabelText('Competent person scheme'), { target: { value: ' Example Scheme ' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(patch).toHaveBeenCalledWith('/organisations/org-1', { nation: 'wales', competentPersonScheme: 'Example Scheme' }));
    await waitFor(() => expect(onClose).toHaveBeenCalled());
  });

  it('clears a scheme emptied by the admin, and refuses a name over 100 characters', async () => {
    const patch = vi.spyOn(api, 'patch').mockResolvedValue({});
    const form = await showSettings('wales', 'Example Scheme');
    const field = within(form).getByLabelText('Competent person scheme');
    fireEvent.change(field, { target: { value: 'x'.repeat(101) } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save' }));
    expect(await within(form).findByText('Scheme: at most 100 characters.')).toBeTruthy();
    expect(patch).not.toHaveBeenCalled();
    fireEvent.change(field, { target: { value: '  ' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(patch).toHaveBeenCalledWith('/organisations/org-1', { nation: 'wales', competentPersonScheme: null }));
  });
});
