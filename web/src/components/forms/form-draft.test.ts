// @vitest-environment happy-dom
import { act, renderHook } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { overlayDraft, readDraft, startingValues, useFormDraft, writeDraft } from './form-draft';

afterEach(() => localStorage.clear());

describe('overlayDraft', () => {
  const recorded = { label: 'RC-01', lengthM: '', wiremap: null as unknown, ends: { a: 'Panel', b: '' }, tags: ['x'] };

  it('lays what was typed over the record, field by field', () => {
    expect(overlayDraft(recorded, { label: 'RC-O1', ends: { b: 'Desk 4' } })).toEqual({ ...recorded, label: 'RC-O1', ends: { a: 'Panel', b: 'Desk 4' } });
  });

  it('takes nothing of another kind than the form holds, nor fields the form no longer has', () => {
    expect(overlayDraft(recorded, { label: 42, tags: 'x', ends: 'Panel', gone: 'old field' })).toEqual(recorded);
  });

  it('takes any value where the record holds nothing yet, for the form to judge when it is saved', () => {
    const wiremap = { nearEnd: [1, 2], farEnd: [1, 2] };
    expect(overlayDraft(recorded, { wiremap }).wiremap).toEqual(wiremap);
  });
});

describe('useFormDraft', () => {
  it('keeps changed values, keeps nothing for values equal to the record, and forgets the draft once saved', () => {
    const recorded = { text: '' };
    const { result, rerender } = renderHook(({ current }) => useFormDraft('note.new.v1', current, recorded, vi.fn()), { initialProps: { current: recorded } });
    expect(readDraft('note.new.v1')).toBeNull();
    rerender({ current: { text: 'Floorboards up' } });
    expect(readDraft('note.new.v1')).toEqual({ text: 'Floorboards up' });
    rerender({ current: { text: '' } });
    expect(readDraft('note.new.v1')).toBeNull();
    rerender({ current: { text: 'Again' } });
    act(() => result.current.settle({ text: '' }));
    expect(readDraft('note.new.v1')).toBeNull();
  });

  it('says a draft was restored, and discarding it goes back to the record', () => {
    writeDraft('note.new.v2', { text: 'Half a note' });
    const recorded = { text: '' };
    expect(startingValues('note.new.v2', recorded)).toEqual({ text: 'Half a note' });
    const onDiscard = vi.fn();
    const { result } = renderHook(() => useFormDraft('note.new.v2', { text: 'Half a note' }, recorded, onDiscard));
    expect(result.current.restored).toBe(true);
    act(() => result.current.discard());
    expect(onDiscard).toHaveBeenCalledWith(recorded);
    expect(result.current.restored).toBe(false);
    expect(readDraft('note.new.v2')).toBeNull();
  });

  it('keeps nothing for a form with no key (a locked visit)', () => {
    renderHook(() => useFormDraft(null, { text: 'typed' }, { text: '' }, vi.fn()));
    expect(localStorage.length).toBe(0);
  });
});
