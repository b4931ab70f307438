/**
 * Whether a circuit needs 30 mA RCD additional protection, and whether an AFDD or an SPD is called for.
 */
import { InvalidInputError, requireNonNegative, requireOneOf, type CheckResult } from '../check.js';
import type { RuleSet } from '../rules/rule-set.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';

import { POINT_LOCATIONS, RCD_CIRCUIT_KINDS, type PointLocation, type RcdCircuitKind } from './before-work-choices.js';

export { POINT_LOCATIONS, RCD_CIRCUIT_KINDS, type PointLocation, type RcdCircuitKind };
/** Who uses the socket-outlets: ordinary persons, or skilled or instructed persons (the exception needs a risk assessment). */
export const USER_SKILLS = ['ordinary', 'skilled'] as const;
export type UserSkill = (typeof USER_SKILLS)[number];
/** Premises where Reg 421.1.7 requires an AFDD on socket-outlet circuits; elsewhere it recommends one. */
export const AFDD_PREMISES = ['other', 'higher-risk-residential', 'hmo', 'student-accommodation', 'care-home'] as const;
export type AfddPremises = (typeof AFDD_PREMISES)[number];

export interface RcdRequiredInput {
  readonly circuitKind: RcdCircuitKind;
  /** Rating of the socket-outlets (A); only for socket circuits. */
  readonly socketRatingA?: number | null;
  readonly location: PointLocation;
  /** Depth of a concealed cable below the wall surface (mm); null where no cable is concealed in a wall. */
  readonly concealedDepthMm?: number | null;
  /** The concealed cable has earthed metal covering, earthed conduit, nail-proof protection or is SELV/PELV (Reg 522.6.204). */
  readonly concealedCableProtected?: boolean;
  readonly wallHasMetalParts?: boolean;
  readonly dwelling: boolean;
  readonly userSkill?: UserSkill;
  /** A documented risk assessment says the socket-outlets need no RCD (never in a dwelling). */
  readonly riskAssessed?: boolean;
  readonly premises?: AfddPremises;
}

export interface RcdReason {
  readonly source: string;
  readonly reason: string;
}

export interface RcdRequirement extends CheckResult {
  readonly required: boolean;
  /** Every regulation that calls for 30 mA additional protection here. */
  readonly reasons: readonly RcdReason[];
  readonly afdd: { readonly level: 'required' | 'recommended' | 'not-applicable'; readonly source: string; readonly note: string };
  readonly spd: { readonly level: 'consider'; readonly source: string; readonly note: string };
}

/**
 * Required is a `pass` when the circuit has a 30 mA RCD and a `fail` when it has none; `hasRcdMa` (optional)
 * is the circuit's RCD rating. Not required is a `pass`.
 */
export function rcdRequired(input: RcdRequiredInput & { readonly hasRcdMa?: number | null }, rules: RuleSet = DEFAULT_RULE_SET): RcdRequirement {
  const kind = requireOneOf('circuitKind', input.circuitKind, RCD_CIRCUIT_KINDS);
  const location = requireOneOf('location', input.location, POINT_LOCATIONS);
  const userSkill = requireOneOf('userSkill', input.userSkill ?? 'ordinary', USER_SKILLS);
  const premises = requireOneOf('premises', input.premises ?? 'other', AFDD_PREMISES);
  if (typeof input.dwelling !== 'boolean') throw new InvalidInputError('dwelling', 'must be true or false');
  const src = rules.beforeWork.rcdRequirements;
  const reasons: RcdReason[] = [];
  let socketRatingA: number | null = null;
  if (kind === 'sockets') {
    if (input.socketRatingA == null) throw new InvalidInputError('socketRatingA', 'give the socket-outlet rating for a socket circuit');
    socketRatingA = requireNonNegative('socketRatingA', input.socketRatingA);
    if (socketRatingA === 0) throw new InvalidInputError('socketRatingA', 'must be greater than zero');
  }
  if (input.riskAssessed && (input.dwelling || userSkill === 'ordinary')) {
    throw new InvalidInputError('riskAssessed', 'the risk-assessment exception applies only outside dwellings, to sockets used by skilled or instructed persons');
  }
  if (socketRatingA !== null && socketRatingA <= src.sockets.value && !input.riskAssessed) {
    reasons.push({ source: src.sockets.source, reason: `socket-outlets rated ${socketRatingA} A, up to ${src.sockets.value} A` });
  }
  if (kind === 'outdoor-mobile' || (location === 'outdoors' && kind === 'sockets')) {
    reasons.push({ source: src.outdoorMobile.source, reason: 'supplies mobile equipment used outdoors' });
  }
  if (kind === 'lighting' && input.dwelling) reasons.push({ source: src.dwellingLuminaires, reason: 'supplies luminaires in a dwelling' });
  if (input.concealedDepthMm != null) {
    const depth = requireNonNegative('concealedDepthMm', input.concealedDepthMm);
    if (depth < src.concealedShallow.value && !input.concealedCableProtected) {
      reasons.push({ source: src.concealedShallow.source, reason: `cable concealed ${depth} mm deep, less than ${src.concealedShallow.value} mm, without other protection` });
    }
    if (input.wallHasMetalParts && !input.concealedCableProtected) {
      reasons.push({ source: src.metalWall, reason: 'cable concealed in a wall with metal parts, at any depth' });
    }
  }
  if (location === 'bathroom') reasons.push({ source: src.bathroom, reason: 'a circuit of a room containing a bath or shower' });

  const required = reasons.length > 0;
  const hasRcd = input.hasRcdMa != null ? requireNonNegative('hasRcdMa', input.hasRcdMa) : null;
  const maxMa = rules.rcd.additionalProtectionMaxMa;
  const protectedOk = hasRcd !== null && hasRcd > 0 && hasRcd <= maxMa.value;
  const why = reasons.map((r) => r.reason).join('; ');
  const source = required ? reasons.map((r) => r.source).join('; ') : `${src.sockets.source}; ${src.dwellingLuminaires}; ${src.concealedShallow.source}; ${src.bathroom}`;

  const afddApplies = kind === 'sockets' && socketRatingA !== null && socketRatingA <= src.sockets.value;
  const afddLevel = !afddApplies ? 'not-applicable' : premises === 'other' ? 'recommended' : 'required';
  const afdd = {
    level: afddLevel,
    source: src.afdd,
    note:
      afddLevel === 'required'
        ? 'An AFDD is required on socket-outlet circuits up to 32 A in these premises.'
        : afddLevel === 'recommended'
          ? 'An AFDD is recommended on socket-outlet circuits up to 32 A.'
          : 'AFDD requirements concern socket-outlet circuits up to 32 A.',
  } as const;
  const spd = {
    level: 'consider',
    source: src.spd,
    note: 'Consider surge protection: it is required where overvoltage could cause serious injury, loss of life or loss of services, and otherwise decided by assessing the risk.',
  } as const;

  if (!required) {
    return { verdict: 'pass', value: hasRcd, limit: null, unit: 'mA', source, note: 'No 30 mA additional protection is called for by what was entered.', required, reasons, afdd, spd };
  }
  if (hasRcd === null) {
    return { verdict: 'check', value: null, limit: maxMa.value, unit: 'mA', source, note: `30 mA RCD protection is required (${why}); record whether the circuit has it.`, required, reasons, afdd, spd };
  }
  return protectedOk
    ? { verdict: 'pass', value: hasRcd, limit: maxMa.value, unit: 'mA', source, note: `30 mA RCD protection is required (${why}) and the circuit has a ${hasRcd} mA RCD.`, required, reasons, afdd, spd }
    : {
        verdict: 'fail',
        value: hasRcd === 0 ? null : hasRcd,
        limit: maxMa.value,
        unit: 'mA',
        source,
        note: `30 mA RCD protection is required (${why}) and the circuit ${hasRcd === 0 ? 'has none' : `has only a ${hasRcd} mA RCD`}: provide it before the work is put into service.`,
        required,
        reasons,
        afdd,
        spd,
      };
}
