import { describe, expect, it } from 'vitest';
import { InvalidInputError } from '../check.js';
import { adiabaticCpc, cpcK } from './adiabatic-cpc.js';

describe('cpcK', () => {
  // BS 7671:2018+A2:2022 Tables 54.2, 54.3 and 54.4, conductors up to 300 mm², as reproduced in the NICEIC pocket guide
  // (Certsure 2018) data from Tables 54.2 to 54.6 (C2: one source)
  it.each([
    ['in-cable', '70C-thermoplastic', 115, 'Table 54.3'],
    ['in-cable', '90C-thermoplastic', 100, 'Table 54.3'],
    ['in-cable', '90C-thermosetting', 143, 'Table 54.3'],
    ['separate', '70C-thermoplastic', 143, 'Table 54.2'],
    ['separate', '90C-thermosetting', 176, 'Table 54.2'],
    ['armour', '70C-thermoplastic', 51, 'Table 54.4'],
    ['armour', '90C-thermosetting', 46, 'Table 54.4'],
  ] as const)('%s, %s: k = %s (%s)', (arrangement, insulation, k, table) => {
    const found = cpcK({ arrangement, insulation });
    expect(found.k).toBe(k);
    expect(found.source).toContain(table);
  });
});

describe('adiabaticCpc', () => {
  it('works S = √(I²t) / k for a twin-and-earth cpc', () => {
    // Reg 543.1.3; 230 A for 0.1 s with k = 115 (Table 54.3): √(230² × 0.1) / 115 = 0.632 mm² (D)
    const r = adiabaticCpc({ faultCurrentA: 230, disconnectionS: 0.1, k: { arrangement: 'in-cable', insulation: '70C-thermoplastic' }, cpcCsaMm2: 1 });
    expect(r.minimumMm2).toBeCloseTo(0.63246, 4);
    expect(r.verdict).toBe('pass');
    expect(r.source).toContain('Reg 543.1.3');
    expect(r.source).toContain('Table 54.3');
  });

  it('fails a cpc smaller than the minimum', () => {
    // 1000 A for 0.4 s, k = 115: √(1000² × 0.4) / 115 = 5.50 mm² (D); a 2.5 mm² cpc is too small
    const r = adiabaticCpc({ faultCurrentA: 1000, disconnectionS: 0.4, k: 115, cpcCsaMm2: 2.5 });
    expect(r.minimumMm2).toBeCloseTo(5.4995, 3);
    expect(r.verdict).toBe('fail');
    expect(adiabaticCpc({ faultCurrentA: 1000, disconnectionS: 0.4, k: 115 }).verdict).toBe('check');
  });

  it('refuses nonsense', () => {
    expect(() => adiabaticCpc({ faultCurrentA: 0, disconnectionS: 0.1, k: 115 })).toThrow(/faultCurrentA/);
    expect(() => adiabaticCpc({ faultCurrentA: 200, disconnectionS: 6, k: 115 })).toThrow(/5 s/);
    expect(() => adiabaticCpc({ faultCurrentA: 200, disconnectionS: 0.1, k: -1 })).toThrow(InvalidInputError);
    expect(() => adiabaticCpc({ faultCurrentA: 200, disconnectionS: 0.1, k: { arrangement: 'bundle' as never, insulation: '70C-thermoplastic' } })).toThrow(/arrangement/);
  });
});
