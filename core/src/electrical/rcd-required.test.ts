import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '../check.js';
import { rcdRequired } from './rcd-required.js';

const indoorsSockets = { circuitKind: 'sockets', socketRatingA: 13, location: 'indoors', dwelling: true } as const;

describe('rcdRequired', () => {
  it('requires 30 mA on socket-outlets up to 32 A (Reg 411.3.3)', () => {
    // BS 7671:2018+A2:2022 Reg 411.3.3: socket-outlets rated up to 32 A (C1); additional protection ≤ 30 mA, Reg 415.1.1 (C1)
    const r = rcdRequired(indoorsSockets);
    expect(r.required).toBe(true);
    expect(r.reasons.map((x) => x.source)).toEqual(['BS 7671:2018+A2:2022 Reg 411.3.3 (socket-outlets rated up to 32 A)']);
    expect(r.verdict).toBe('check');
    expect(rcdRequired({ ...indoorsSockets, hasRcdMa: 30 }).verdict).toBe('pass');
    const none = rcdRequired({ ...indoorsSockets, hasRcdMa: 0 });
    expect(none.verdict).toBe('fail');
    expect(none.note).toMatch(/has none/);
    expect(rcdRequired({ ...indoorsSockets, hasRcdMa: 100 }).verdict).toBe('fail');
    // 32 A is still within the regulation; a 63 A industrial socket-outlet is not
    expect(rcdRequired({ ...indoorsSockets, socketRatingA: 32 }).required).toBe(true);
    expect(rcdRequired({ ...indoorsSockets, socketRatingA: 63, dwelling: false }).required).toBe(false);
  });

  it('lets a documented risk assessment off only outside dwellings, for skilled users', () => {
    // BS 7671:2018+A2:2022 Reg 411.3.3 exception (M: wording from memory)
    expect(rcdRequired({ ...indoorsSockets, dwelling: false, userSkill: 'skilled', riskAssessed: true }).required).toBe(false);
    expect(() => rcdRequired({ ...indoorsSockets, userSkill: 'skilled', riskAssessed: true })).toThrow(/riskAssessed/);
  });

  it('requires it for luminaires in a dwelling only (Reg 411.3.4)', () => {
    // BS 7671:2018+A2:2022 Reg 411.3.4 (trade reference §9, M)
    const lights = { circuitKind: 'lighting', location: 'indoors', dwelling: true } as const;
    expect(rcdRequired(lights).reasons[0]?.source).toContain('Reg 411.3.4');
    expect(rcdRequired({ ...lights, dwelling: false }).required).toBe(false);
  });

  it('requires it for cables concealed less than 50 mm deep without other protection (Reg 522.6.202)', () => {
    // 50 mm: BS 7671:2018+A2:2022 Reg 522.6.202 (C1)
    const cooker = { circuitKind: 'cooker', location: 'indoors', dwelling: true } as const;
    expect(rcdRequired({ ...cooker, concealedDepthMm: 49 }).reasons[0]?.source).toBe('BS 7671:2018+A2:2022 Reg 522.6.202');
    expect(rcdRequired({ ...cooker, concealedDepthMm: 50 }).required).toBe(false);
    expect(rcdRequired({ ...cooker, concealedDepthMm: 20, concealedCableProtected: true }).required).toBe(false);
    expect(rcdRequired(cooker).required).toBe(false);
  });

  it('requires it in a wall with metal parts at any depth (Reg 522.6.203)', () => {
    // BS 7671:2018+A2:2022 Reg 522.6.203 (C1)
    const r = rcdRequired({ circuitKind: 'cooker', location: 'indoors', dwelling: true, concealedDepthMm: 80, wallHasMetalParts: true });
    expect(r.reasons.map((x) => x.source)).toEqual(['BS 7671:2018+A2:2022 Reg 522.6.203']);
  });

  it('requires it for every circuit of a bath or shower room (Section 701)', () => {
    // BS 7671:2018+A2:2022 Section 701, Reg 701.411.3.3 (M: number from memory)
    const shower = rcdRequired({ circuitKind: 'shower', location: 'bathroom', dwelling: true, hasRcdMa: 30 });
    expect(shower.required).toBe(true);
    expect(shower.source).toContain('Section 701');
    expect(shower.verdict).toBe('pass');
  });

  it('names the AFDD and SPD regulations', () => {
    // BS 7671:2018+A2:2022 Reg 421.1.7 (AFDDs required in HRRBs, HMOs, student accommodation and care homes, recommended
    // elsewhere) and Reg 443.4 (SPDs): trade reference §9, M
    expect(rcdRequired(indoorsSockets).afdd).toMatchObject({ level: 'recommended', source: 'BS 7671:2018+A2:2022 Reg 421.1.7' });
    expect(rcdRequired({ ...indoorsSockets, premises: 'hmo' }).afdd.level).toBe('required');
    expect(rcdRequired({ circuitKind: 'lighting', location: 'indoors', dwelling: true }).afdd.level).toBe('not-applicable');
    expect(rcdRequired(indoorsSockets).spd).toMatchObject({ level: 'consider', source: 'BS 7671:2018+A2:2022 Reg 443.4' });
  });

  it('refuses nonsense', () => {
    expect(() => rcdRequired({ ...indoorsSockets, circuitKind: 'kettle' as never })).toThrow(InvalidInputError);
    expect(() => rcdRequired({ ...indoorsSockets, socketRatingA: null })).toThrow(/socketRatingA/);
    expect(() => rcdRequired({ ...indoorsSockets, socketRatingA: 0 })).toThrow(/socketRatingA/);
    expect(() => rcdRequired({ ...indoorsSockets, location: 'attic' as never })).toThrow(/location/);
    expect(() => rcdRequired({ ...indoorsSockets, concealedDepthMm: -5 })).toThrow(/concealedDepthMm/);
    expect(() => rcdRequired({ ...indoorsSockets, dwelling: 'yes' as never })).toThrow(/dwelling/);
  });
});
