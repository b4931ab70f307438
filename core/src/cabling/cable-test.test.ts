import { describe, expect, it } from 'vitest';
import { assessCableRun } from './cable-test.js';
import { T568A, T568B } from './pin-schemes.js';

describe('assessCableRun', () => {
  it('passes a Cat6 permanent link terminated T568B at both ends within 90 m (ANSI/TIA-568; ISO/IEC 11801)', () => {
    const result = assessCableRun({ medium: 'Cat6', scheme: 'T568B', wiremap: { nearEnd: T568B, farEnd: T568B }, lengthM: 42.5, linkKind: 'permanent-link' });
    expect(result.verdict).toBe('pass');
    expect(result.length).toMatchObject({ verdict: 'pass', limit: 90 });
    expect(result.missing).toEqual([]);
  });

  it('fails a split pair and names its pins (ANSI/TIA-568 field test wiremap: split pair)', () => {
    // Pairs laid in colour order (1-2, 3-4, 5-6, 7-8): pin to pin continuity is right, but 3,6 and 4,5 are split.
    const inOrder = ['white-orange', 'orange', 'white-green', 'green', 'white-blue', 'blue', 'white-brown', 'brown'] as const;
    const result = assessCableRun({ medium: 'Cat6', scheme: 'T568B', wiremap: { nearEnd: inOrder, farEnd: inOrder }, lengthM: 30 });
    expect(result.verdict).toBe('fail');
    expect(result.wiremap!.faults.map((f) => [f.kind, f.pins])).toEqual([
      ['split', [3, 6]],
      ['split', [4, 5]],
    ]);
  });

  it('fails a permanent link over 90 m and a channel over 100 m (ANSI/TIA-568; ISO/IEC 11801)', () => {
    expect(assessCableRun({ medium: 'Cat5e', scheme: 'T568B', wiremap: { nearEnd: T568B, farEnd: T568B }, lengthM: 92.3 }).length).toMatchObject({ verdict: 'fail', limit: 90 });
    expect(assessCableRun({ medium: 'Cat5e', scheme: 'T568B', wiremap: { nearEnd: T568B, farEnd: T568B }, lengthM: 99, linkKind: 'channel' }).verdict).toBe('pass');
  });

  it('shows a T568A end on a T568B end as crossed pairs (ANSI/TIA-568: pairs 2 and 3 swap, 1,2 ↔ 3,6)', () => {
    const result = assessCableRun({ medium: 'Cat6A', scheme: 'T568B', wiremap: { nearEnd: T568A, farEnd: T568B }, lengthM: 12 });
    expect(result.wiremap!.faults[0]).toMatchObject({ kind: 'crossed', pins: [1, 2, 3, 6], end: 'near' });
  });

  it('lists what is still to record', () => {
    const result = assessCableRun({ medium: 'Cat6' });
    expect(result.verdict).toBe('check');
    expect(result.missing).toEqual(['the termination scheme (T568A or T568B)', 'the wiremap', 'the length']);
  });

  it('reports a colour recorded on two pins instead of throwing', () => {
    const twice = [...T568B.slice(0, 7), 'white-orange'] as const;
    const result = assessCableRun({ medium: 'Cat6', scheme: 'T568B', wiremap: { nearEnd: twice, farEnd: T568B }, lengthM: 5 });
    expect(result.problems[0]).toMatch(/more than one pin/);
    expect(result.verdict).toBe('check');
  });

  it('does not invent a length limit for coax', () => {
    const result = assessCableRun({ medium: 'coax', lengthM: 18 });
    expect(result.length).toBeNull();
    expect(result.notes[0]).toMatch(/No published length limit for coax/);
  });
});
