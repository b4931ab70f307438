// @vitest-environment happy-dom
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { assessCircuitTest, VERDICT_DISCLAIMER } from '@wiretrail/core';
import { afterEach, describe, expect, it } from 'vitest';
import { VerdictChip } from './verdict-chip';

afterEach(cleanup);

// The demo's ground-floor ring, a 32 A type B with a 30 mA RCD. Zs 1.25 Ω is above 0.8 × 1.37 = 1.10 Ω
// (BS 7671:2018+A2:2022 Table 41.3, B32; Appendix 3, 80 % rule for readings taken cold).
const ring = assessCircuitTest({
  circuit: { kind: 'ring', deviceType: 'B', deviceRatingA: 32, rcdRatingMa: 30, rcdType: 'A', liveCsaMm2: 2.5, cpcCsaMm2: 1.5 },
  readings: { zsOhm: 1.25 },
});
const zs = ring.lines.find((l) => l.key === 'zs')!;

describe('a verdict chip', () => {
  it('opens to the reading, the limit, its source and the disclaimer', () => {
    render(<VerdictChip what="Circuit 1: Zs" result={zs.result} />);
    fireEvent.click(screen.getByRole('button', { name: 'Circuit 1: Zs: Fail · limit 1.10 Ω. Show how it was judged' }));
    const dialog = screen.getByRole('dialog', { name: 'Circuit 1: Zs: Fail' });
    expect(dialog.textContent).toContain('Reading1.25 Ω');
    expect(dialog.textContent).toContain('Limit1.10 Ω');
    expect(dialog.textContent).toMatch(/SourceBS 7671:2018\+A2:2022 Table 41\.3/);
    expect(dialog.textContent).toContain(VERDICT_DISCLAIMER);
  });

  it('leaves the limit to the dialog where the reading stands beside it, and says what a row sums up', () => {
    render(<VerdictChip what="Circuit 1: Zs" result={zs.result} size="small" against="none" prefix="Overall" />);
    expect(screen.getByRole('button', { name: 'Circuit 1: Zs: Fail. Show how it was judged' }).textContent).toBe('Overall: Fail');
  });

  it('only says a verdict that has nothing to open', () => {
    render(<VerdictChip verdict="check" prefix="Tests" />);
    expect(screen.getByText('Tests: Check')).toBeTruthy();
    expect(screen.queryByRole('button')).toBeNull();
  });
});
