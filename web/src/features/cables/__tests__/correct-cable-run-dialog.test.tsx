// @vitest-environment happy-dom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { assessCableRun } from '@wiretrail/core';
import { describe, expect, it, vi } from 'vitest';
import { officeApiForEachTest, sentBy } from '@/testing/office-api';
import type { CableRun } from '../api/get-cable-runs';
import { CorrectCableRunDialog } from '../desk/correct-cable-run-dialog';

const run = {
  id: '01900000-0000-7000-8000-0000000000c1', version: 4, siteId: 's1', label: 'RC-02', medium: 'Cat6', endAAreaId: 'a1', endADescription: 'Patch panel port 2',
  endATermination: null, endBAreaId: 'a2', endBDescription: 'Unlabelled, behind the X-ray unit', endBTermination: null, status: 'unidentified', traceMethod: null,
  lengthM: null, nvp: null, tdrNs: null, scheme: null, linkKind: null, verdict: null, testedAt: null, lastVisitId: null, recordedAt: null, voidedAt: null, voidReason: null,
  traceLog: null, besidePower: null, powerCableKind: null, dataCableKind: null, containment: null, parallelRunM: null, separationMm: null, fireClass: null, endAAreaName: 'Comms cupboard',
  endBAreaName: 'Surgery 1', assessment: assessCableRun({ medium: 'Cat6' }),
} satisfies CableRun;

const api = officeApiForEachTest(async (_url, init) => new Response(JSON.stringify({ ...run, ...JSON.parse(String(init?.body)) }), { status: 200 }));

function show(onClose = vi.fn()) {
  render(
    <QueryClientProvider client={new QueryClient()}>
      <CorrectCableRunDialog run={run} onClose={onClose} />
    </QueryClientProvider>,
  );
  return { dialog: within(screen.getByRole('dialog', { name: 'Correct cable RC-02' })), onClose };
}

describe('correcting a cable run', () => {
  it('needs a label of at most 100 characters', async () => {
    const { dialog } = show();
    fireEvent.input(dialog.getByLabelText('Label'), { target: { value: '' } });
    fireEvent.click(dialog.getByRole('button', { name: 'Save correction' }));
    expect(await dialog.findByText('Label must not be empty.')).toBeTruthy();
    fireEvent.input(dialog.getByLabelText('Label'), { target: { value: 'R'.repeat(101) } });
    fireEvent.click(dialog.getByRole('button', { name: 'Save correction' }));
    expect(await dialog.findByText('Label must be at most 100 characters.')).toBeTruthy();
    expect(api.fetch).not.toHaveBeenCalled();
  });

  it('sends only what was corrected', async () => {
    const { dialog, onClose } = show();
    fireEvent.input(dialog.getByLabelText('Label'), { target: { value: 'RC-02A' } });
    fireEvent.input(dialog.getByLabelText('To position'), { target: { value: 'X-ray unit, wall plate' } });
    fireEvent.click(dialog.getByRole('button', { name: 'Save correction' }));
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(sentBy(api.fetch)).toEqual({ url: `/api/cable-runs/${run.id}`, method: 'PATCH', body: { label: 'RC-02A', endBDescription: 'X-ray unit, wall plate' } });
  });
});
