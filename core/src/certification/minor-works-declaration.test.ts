import { describe, expect, it } from 'vitest';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';
import { amendedTo, editionParts, minorWorksDeclaration } from './minor-works-declaration.js';

describe('the declaration a minor works certificate carries', () => {
  it('splits an edition into the standard and the amendment it is amended to', () => {
    // BS 7671:2018 Amendment 2 was published in 2022; Amendment 3 in 2024.
    expect(editionParts('BS 7671:2018+A2:2022')).toEqual({ standard: 'BS 7671:2018', amendment: 'A2:2022' });
    expect(editionParts('BS 7671:2018+A2:2022+A3:2024')).toEqual({ standard: 'BS 7671:2018', amendment: 'A3:2024' });
    expect(editionParts('BS 7671:2018')).toEqual({ standard: 'BS 7671:2018', amendment: null });
    expect(amendedTo('BS 7671:2018')).toBe('BS 7671:2018');
  });

  it('says, as the model form in BS 7671:2018+A2:2022 Appendix 6 asks, that the work does not impair the existing installation and was done to the standard as amended', () => {
    const text = minorWorksDeclaration(DEFAULT_RULE_SET.edition);
    expect(text).toContain('does not impair the safety of the existing installation');
    expect(text).toContain('designed, constructed, inspected and tested in accordance with BS 7671:2018 as amended to A2:2022');
    expect(text).toContain('complies with BS 7671 except for the departures recorded on this certificate');
    // The verdicts' own caution belongs to the app, not to what the signer declares.
    expect(text).not.toMatch(/aid|substitute/);
  });
});
