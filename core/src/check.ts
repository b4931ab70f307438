/**
 * The shape every check returns, and the input guards shared by all calculations.
 */

/** `check` means the figures are not enough to decide: a reading is missing or looks wrong. */
export type Verdict = 'pass' | 'fail' | 'check';

export interface CheckResult {
  readonly verdict: Verdict;
  /** The figure that was judged (a reading or a computed value); null when the reading is missing. */
  readonly value: number | null;
  /** The figure it was judged against; null where no single limit applies. */
  readonly limit: number | null;
  readonly unit: string;
  /** The published table or clause the limit comes from. */
  readonly source: string;
  /** One plain sentence for the technician. */
  readonly note: string;
}

/** A check with a stable name, so screens can place it beside the reading it concerns. */
export type Finding = CheckResult & { readonly name: string };

/** Shown beside verdicts on every screen and document. */
export const VERDICT_DISCLAIMER =
  'Wiretrail verdicts are an aid to checking figures, not a certificate of compliance: ' +
  'the wiring regulations in force, local codes and a competent person decide (a licensed electrician only where local law requires one).';

/** Thrown for inputs that make no physical sense or that the rule set has no published value for. */
export class InvalidInputError extends Error {
  readonly field: string;

  constructor(field: string, message: string) {
    super(`${field}: ${message}`);
    this.name = 'InvalidInputError';
    this.field = field;
  }
}

/** A reading the technician has not entered yet. */
export type Reading = number | null | undefined;

const VERDICT_RANK: Readonly<Record<Verdict, number>> = { pass: 0, check: 1, fail: 2 };

/** The overall verdict of several findings: any fail fails, otherwise any check asks for a look. */
export function worstVerdict(verdicts: readonly Verdict[]): Verdict {
  let worst: Verdict = 'pass';
  for (const v of verdicts) {
    if (VERDICT_RANK[v] > VERDICT_RANK[worst]) worst = v;
  }
  return worst;
}

/** Rounds half away from zero to `places` decimals, correcting binary noise such as 1.005 * 100. */
export function roundTo(value: number, places: number): number {
  const factor = 10 ** places;
  const scaled = Math.abs(value) * factor;
  const rounded = Math.round(Number(scaled.toPrecision(12)));
  return (Math.sign(value) * rounded) / factor;
}

export function requireFinite(field: string, value: unknown): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new InvalidInputError(field, `must be a finite number, got ${describe(value)}`);
  }
  return value;
}

export function requireNonNegative(field: string, value: unknown): number {
  const n = requireFinite(field, value);
  if (n < 0) throw new InvalidInputError(field, `must not be negative, got ${n}`);
  return n;
}

export function requirePositive(field: string, value: unknown): number {
  const n = requireFinite(field, value);
  if (n <= 0) throw new InvalidInputError(field, `must be greater than zero, got ${n}`);
  return n;
}

/** A measured value that may still be missing: null/undefined pass through, anything else must be a real, non-negative number. */
export function optionalReading(field: string, value: unknown): number | null {
  if (value === null || value === undefined) return null;
  return requireNonNegative(field, value);
}

export function requireOneOf<T extends string | number>(field: string, value: unknown, allowed: readonly T[]): T {
  if (!allowed.includes(value as T)) {
    throw new InvalidInputError(field, `must be one of ${allowed.join(', ')}, got ${describe(value)}`);
  }
  return value as T;
}

export function requireObject(field: string, value: unknown): Record<string, unknown> {
  if (typeof value !== 'object' || value === null) {
    throw new InvalidInputError(field, `must be an object, got ${describe(value)}`);
  }
  return value as Record<string, unknown>;
}

function describe(value: unknown): string {
  if (typeof value === 'string') return JSON.stringify(value);
  if (typeof value === 'number') return String(value);
  if (value === null) return 'null';
  if (value === undefined) return 'nothing';
  return typeof value;
}

/** Looks a key up in a published table, throwing a clear error for keys the table does not list. */
export function tableRow(
  field: string,
  key: number,
  table: { readonly rows: Readonly<Record<number, number>>; readonly source: string },
): number {
  const value = Object.hasOwn(table.rows, String(key)) ? table.rows[key] : undefined;
  if (value === undefined) {
    const listed = Object.keys(table.rows).map(Number).sort((a, b) => a - b).join(', ');
    throw new InvalidInputError(field, `${key} is not listed in ${table.source} (listed: ${listed})`);
  }
  return value;
}
