// @vitest-environment happy-dom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import type { ReactNode } from 'react';
import { describe, expect, it } from 'vitest';
import { OFFICE_USER, officeApiForEachTest } from '@/testing/office-api';
import { AddPersonDialog } from '../components/add-person-dialog';
import { TeamTable } from '../components/team-table';

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status });
const refusal = (statusCode: number, message: string | string[], error: string) => json(statusCode, { statusCode, message, error });
const api = officeApiForEachTest();

function show(ui: ReactNode) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  render(<QueryClientProvider client={client}>{ui}</QueryClientProvider>);
}

const fill = (label: string, value: string) => fireEvent.input(screen.getByLabelText(label), { target: { value } });
const helperOf = (label: string) => {
  const input = screen.getByLabelText(label);
  return document.getElementById(input.getAttribute('aria-describedby') ?? '')?.textContent;
};

describe("the Team page's refusals", () => {
  it("puts the server's refusal of a new person beside the fields it names, with no banner", async () => {
    api.fetch.mockResolvedValueOnce(refusal(400, ['email must be an e-mail address', 'name must be shorter than or equal to 200 characters'], 'Bad Request'));
    show(<AddPersonDialog open onClose={() => {}} />);
    fill('Name', 'Priya Ansell');
    fill('E-mail', 'priya@larkfield.example');
    fireEvent.click(screen.getByRole('button', { name: 'Add person' }));
    await waitFor(() => expect(helperOf('E-mail')).toBe('E-mail must be an e-mail address.'));
    expect(helperOf('Name')).toBe('Name must be shorter than or equal to 200 characters.');
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('says beside the e-mail that someone already has it', async () => {
    api.fetch.mockResolvedValueOnce(refusal(409, 'A user with that e-mail already exists.', 'Conflict'));
    show(<AddPersonDialog open onClose={() => {}} />);
    fill('Name', 'Sam Okafor');
    fill('E-mail', 'tech1@larkfield.example');
    fireEvent.click(screen.getByRole('button', { name: 'Add person' }));
    await waitFor(() => expect(helperOf('E-mail')).toBe('A user with that e-mail already exists.'));
  });

  it("shows a refused change of role in that person's row, beside the role", async () => {
    const people = [
      { id: OFFICE_USER.id, email: OFFICE_USER.email, name: OFFICE_USER.name, role: 'office', active: true },
      { id: 'u2', email: 'tech1@larkfield.example', name: 'Sam Okafor', role: 'technician', active: true },
    ];
    api.fetch.mockImplementation(async (_url, init) => {
      if (init?.method === 'PATCH') return refusal(403, 'Only an admin may change a role.', 'Forbidden');
      return json(200, { items: people, total: 2, page: 1, pageSize: 50 });
    });
    show(<TeamTable />);
    const role = await screen.findByRole('combobox', { name: 'Role of Sam Okafor' });
    fireEvent.mouseDown(role);
    fireEvent.click(within(await screen.findByRole('listbox')).getByRole('option', { name: 'Office' }));
    fireEvent.click(await screen.findByRole('button', { name: 'Yes, change it' }));
    const rowOf = (name: string) => screen.getByText(name).closest('tr')!;
    const row = rowOf('Sam Okafor');
    expect(await within(row).findByText('Role not changed: Only an admin may change a role.')).toBeTruthy();
    expect(within(rowOf('Dan Whitlow')).queryByText(/not changed/)).toBeNull();
  });
});
