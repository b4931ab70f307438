import { describe, expect, it } from 'vitest';
import { CONDUCTOR_SIZES_MM2, circuitDetailProblems, RCD_TYPE_CHOICES, standardRatings } from './circuit-details-check.js';

describe('a circuit’s details that cannot be so', () => {
  it('knows the ratings each device is made in from the maximum Zs tables', () => {
    // BS 7671:2018+A2:2022 Table 41.3: type B circuit-breakers 6 A to 125 A
    expect(standardRatings('B')).toEqual([6, 10, 16, 20, 25, 32, 40, 50, 63, 80, 100, 125]);
    // Tables 41.2 and 41.4, BS 3036 semi-enclosed fuses: 5 A to 100 A (M, as the rule set holds them)
    expect(standardRatings('BS 3036')).toEqual([5, 15, 20, 30, 45, 60, 100]);
    expect(standardRatings('Made up')).toBeNull();
  });

  it('refuses a 17 A type B breaker, an RCD of type Q and a 4 mm² cpc with 2.5 mm² live conductors', () => {
    expect(circuitDetailProblems({ deviceType: 'B', deviceRatingA: 17, rcdType: 'Q', liveCsaMm2: 2.5, cpcCsaMm2: 4 })).toEqual({
      deviceRatingA: 'Rating: this device is not made in 17 A. Choose one of 6, 10, 16, 20, 25, 32, 40, 50, 63, 80, 100, 125 A.',
      rcdType: 'RCD type must be AC, A, F or B, with S if it is time-delayed.',
      cpcCsaMm2: 'Cpc size: 4 mm² is larger than the 2.5 mm² live conductors it runs with; check both sizes.',
    });
    expect(circuitDetailProblems({ liveCsaMm2: 2.7 })).toEqual({ liveCsaMm2: 'Live size: cables are not made in 2.7 mm². Sizes run 1, 1.5, 2.5, 4, 6, 10, 16 mm² and up.' });
  });

  it('takes what a consumer unit holds: a B32 ring in 2.5/1.5 behind a type A RCD, a time-delayed type S main switch', () => {
    expect(circuitDetailProblems({ deviceType: 'B', deviceRatingA: 32, rcdType: 'A', liveCsaMm2: 2.5, cpcCsaMm2: 1.5 })).toEqual({});
    expect(circuitDetailProblems({ rcdType: 'a s' })).toEqual({});
    expect(circuitDetailProblems({ deviceType: 'BS 1362', deviceRatingA: 13, liveCsaMm2: 6, cpcCsaMm2: 6 })).toEqual({});
  });

  it('takes every value the forms offer', () => {
    // The offered lists must never be refused by the check they feed.
    for (const rcdType of RCD_TYPE_CHOICES) expect(circuitDetailProblems({ rcdType })).toEqual({});
    for (const size of CONDUCTOR_SIZES_MM2) expect(circuitDetailProblems({ liveCsaMm2: size, cpcCsaMm2: size })).toEqual({});
  });
});
