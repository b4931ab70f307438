import { describe, expect, it } from 'vitest';
import { ruleSetInForce } from '../rules/rules-in-force.js';
import { amendedTo, editionParts, minorWorksDeclaration } from './minor-works-declaration.js';

describe('the declaration a minor works certificate carries', () => {
  it('splits an edition into the standard and the amendment it is amended to', () => {
    // BS 7671:2018 Amendment 2 was published in 2022; Amendment 3 in 2024.
    expect(editionParts('BS 7671:2018+A2:2022')).toEqual({ standard: 'BS 7671:2018', amendment: 'A2:2022' });
    expect(editionParts('BS 7671:2018+A2:2022+A3:2024')).toEqual({ standard: 'BS 7671:2018', amendment: 'A3:2024' });
    expect(editionParts('BS 7671:2018')).toEqual({ standard: 'BS 7671:2018', amendment: null });
    expect(amendedTo('BS 7671:2018')).toBe('BS 7671:2018');
  });

  it('says, as the model form in BS 7671:2018+A2:2022 Appendix 6 asks, that the work does not impair the existing installation and was done to the amendment in force on its completion date', () => {
    // Work completed on 5 December 2026 falls under A3:2024 (in force from 31 July 2024).
    const text = minorWorksDeclaration(ruleSetInForce('2026-12-05')!.edition, '5 December 2026');
    expect(text).toContain('does not impair the safety of the existing installation');
    expect(text).toContain('designed, constructed, inspected and tested in accordance with BS 7671:2018+A3:2024, in force on 5 December 2026');
    expect(text).not.toContain('as amended to');
    expect(text).toContain('complies with BS 7671 except for the departures recorded on this certificate');
    // The verdicts' own caution belongs to the app, not to what the signer declares.
    expect(text).not.toMatch(/aid|substitute/);
  });
});
