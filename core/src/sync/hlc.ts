/**
 * Hybrid logical clocks: `<ISO-8601 UTC time with ms>-<4 hex digit counter>-<deviceId>`.
 * The fixed-width time and counter make the strings sort in time order; the device id breaks ties,
 * so every device and the server pick the same winner for concurrent edits.
 */
export interface Hlc {
  readonly ms: number;
  readonly counter: number;
  readonly deviceId: string;
}

const PATTERN = /^(\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z)-([0-9a-f]{4})-([A-Za-z0-9_-]{1,64})$/;
const MAX_COUNTER = 0xffff;
/** A device clock this far ahead of the receiver is not believed. */
export const MAX_CLOCK_DRIFT_MS = 24 * 60 * 60 * 1000;
/**
 * No change can be older than the product: a clock before this is a device whose date was never set (or a forged
 * one), and it would lose every merge it took part in.
 */
/**
 * A pushing device's clock may run this far ahead of the server's before its changes are refused until its clock
 * is put right. Phones that set their time from the network are within seconds (product's own allowance).
 */
export const MAX_CLOCK_AHEAD_MS = 5 * 60 * 1000;
export const EARLIEST_HLC_MS = Date.UTC(2020, 0, 1);

export function formatHlc({ ms, counter, deviceId }: Hlc): string {
  return `${new Date(ms).toISOString()}-${counter.toString(16).padStart(4, '0')}-${deviceId}`;
}

export function parseHlc(value: string): Hlc | null {
  const m = PATTERN.exec(value);
  if (!m) return null;
  const ms = Date.parse(m[1]!);
  // Date.parse rolls 2026-02-31 over into March; a real date prints back exactly as it was written.
  if (!Number.isFinite(ms) || ms < EARLIEST_HLC_MS || new Date(ms).toISOString() !== m[1]) return null;
  return { ms, counter: parseInt(m[2]!, 16), deviceId: m[3]! };
}

export function isHlc(value: unknown): value is string {
  return typeof value === 'string' && parseHlc(value) !== null;
}

/**
 * Why a device's clock cannot be taken, or null: a change stamped further ahead of the receiver's time than
 * `maxAheadMs` would win every later concurrent edit until the world caught up with it.
 */
export function clockProblem(value: unknown, nowMs: number, maxAheadMs: number): string | null {
  const hlc = typeof value === 'string' ? parseHlc(value) : null;
  if (!hlc) return 'hlc must look like 2026-03-14T09:26:53.589Z-0001-<deviceId>, with a real date from 2020 on.';
  if (hlc.ms > nowMs + maxAheadMs) {
    return `This phone's clock is ahead of the office system's by more than ${Math.round(maxAheadMs / 60_000)} minutes. Set the phone's date and time to automatic, then sync again.`;
  }
  return null;
}

/** Orders two clocks; equal time and counter fall back to the device id. */
export function compareHlc(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/** The clock for a new local event: never behind the last one, even if the wall clock stepped back. */
export function tickHlc(last: Hlc | null, nowMs: number, deviceId: string): Hlc {
  if (!last || nowMs > last.ms) return { ms: nowMs, counter: 0, deviceId };
  if (last.counter >= MAX_COUNTER) return { ms: last.ms + 1, counter: 0, deviceId };
  return { ms: last.ms, counter: last.counter + 1, deviceId };
}

/** Moves the local clock past a clock seen from elsewhere, so later local events sort after it. */
export function receiveHlc(local: Hlc | null, remote: Hlc, nowMs: number, deviceId: string): Hlc {
  const remoteMs = Math.min(remote.ms, nowMs + MAX_CLOCK_DRIFT_MS);
  const base = Math.max(nowMs, local?.ms ?? 0, remoteMs);
  let counter = 0;
  if (base === local?.ms && base === remoteMs) counter = Math.max(local.counter, remote.counter) + 1;
  else if (base === local?.ms) counter = local.counter + 1;
  else if (base === remoteMs) counter = remote.counter + 1;
  return counter > MAX_COUNTER ? { ms: base + 1, counter: 0, deviceId } : { ms: base, counter, deviceId };
}
