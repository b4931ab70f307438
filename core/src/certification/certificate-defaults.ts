/**
 * The standard values a certificate's circuit details usually take, offered on the phone where nothing is recorded
 * yet: the product standard a protective device is made to, and the longest disconnection time the regulations
 * allow for the circuit. Each is an offer the technician confirms or changes, never a reading.
 */
import type { PROTECTIVE_DEVICES } from '../sync/entities.js';

type ProtectiveDevice = (typeof PROTECTIVE_DEVICES)[number];

export interface SourcedText {
  readonly value: string;
  readonly source: string;
}

/** Circuit-breakers for household and similar installations. */
export const CIRCUIT_BREAKER_STANDARD = 'BS EN 60898-1';
/** An RCD without overcurrent protection (RCCB). */
export const RCCB_STANDARD = 'BS EN 61008-1';
/** An RCD with overcurrent protection (RCBO): the breaker and the RCD in one device. */
export const RCBO_STANDARD = 'BS EN 61009-1';
/** RCDs of type F and type B, on top of the RCCB or RCBO standard. */
export const RCD_TYPE_F_B_STANDARD = 'BS EN 62423';
/** Arc fault detection devices. */
export const AFDD_STANDARD = 'BS EN 62606';

/** The product standard of each kind of protective device the app records; a fuse's kind is its standard. */
export const DEVICE_STANDARDS: Readonly<Record<ProtectiveDevice, string>> = {
  B: CIRCUIT_BREAKER_STANDARD,
  C: CIRCUIT_BREAKER_STANDARD,
  D: CIRCUIT_BREAKER_STANDARD,
  'BS 88-2': 'BS 88-2',
  'BS 88-3': 'BS 88-3',
  'BS 3036': 'BS 3036',
  'BS 1362': 'BS 1362',
};

/** The standards a technician picks from for each device, the usual first. */
export const DEVICE_STANDARD_CHOICES: readonly string[] = [CIRCUIT_BREAKER_STANDARD, RCBO_STANDARD, 'BS 88-2', 'BS 88-3', 'BS 3036', 'BS 1362'];
export const RCD_STANDARD_CHOICES: readonly string[] = [RCCB_STANDARD, RCBO_STANDARD, RCD_TYPE_F_B_STANDARD];

/** The standard a device of this kind is made to, or null when the kind is not known. */
export function deviceStandardFor(deviceType: string | null | undefined): string | null {
  return deviceType && Object.prototype.hasOwnProperty.call(DEVICE_STANDARDS, deviceType) ? DEVICE_STANDARDS[deviceType as ProtectiveDevice] : null;
}

/** The standard an RCD of this type is usually made to: type F and B have their own, A and AC the RCCB's. */
export function rcdStandardFor(rcdType: string | null | undefined): string {
  return /\b[FB]\b|^[FB]/i.test((rcdType ?? '').trim()) ? RCD_TYPE_F_B_STANDARD : RCCB_STANDARD;
}

const TABLE_41_1 = 'BS 7671:2018+A2:2022 Reg 411.3.2.2 and Table 41.1 (final circuits, U0 230 V)';

/**
 * The longest disconnection time allowed, in seconds, at U0 = 230 V. Final circuits up to 63 A with socket-outlets
 * and up to 32 A feeding fixed equipment only take Table 41.1 (0.4 s TN, 0.2 s TT); other circuits 5 s on TN
 * (Reg 411.3.2.3) and 1 s on TT (Reg 411.3.2.4). Between 32 A and 63 A it depends on whether the circuit serves
 * socket-outlets, which only a ring final circuit says for certain, so nothing is offered there.
 */
export const DISCONNECTION_TIMES = {
  finalTn: { value: 0.4, source: TABLE_41_1 },
  finalTt: { value: 0.2, source: TABLE_41_1 },
  otherTn: { value: 5, source: 'BS 7671:2018+A2:2022 Reg 411.3.2.3 (distribution circuits and other circuits, TN)' },
  otherTt: { value: 1, source: 'BS 7671:2018+A2:2022 Reg 411.3.2.4 (distribution circuits and other circuits, TT)' },
} as const;

export interface DisconnectionTimeOffer {
  readonly seconds: number;
  readonly source: string;
}

export function standardDisconnectionTime(
  circuit: { readonly kind?: string | null; readonly deviceRatingA?: number | null },
  earthing: string | null | undefined,
): DisconnectionTimeOffer | null {
  const rating = circuit.deviceRatingA;
  if (!earthing || typeof rating !== 'number' || !Number.isFinite(rating) || rating <= 0) return null;
  const tt = earthing === 'TT';
  let limit: { value: number; source: string } | null;
  if (rating <= 32 || (rating <= 63 && circuit.kind === 'ring')) limit = tt ? DISCONNECTION_TIMES.finalTt : DISCONNECTION_TIMES.finalTn;
  else if (rating > 63) limit = tt ? DISCONNECTION_TIMES.otherTt : DISCONNECTION_TIMES.otherTn;
  else limit = null;
  return limit && { seconds: limit.value, source: limit.source };
}
