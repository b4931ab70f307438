/**
 * Randomness a failed run can repeat: the seed comes from the named variable when set, is printed, and every
 * choice a suite makes follows from it (mulberry32).
 */
export interface SeededRandom {
  readonly seed: number;
  /** In [0, 1). */
  next(): number;
  /** A whole number from `min` to `max`, both included. */
  int(min: number, max: number): number;
  pick<T>(items: readonly T[]): T;
  chance(p: number): boolean;
}

export function seededRandom(variable: string): SeededRandom {
  const given = process.env[variable];
  const seed = given ? Number(given) >>> 0 : (Date.now() ^ (process.pid << 16)) >>> 0;
  let state = seed;
  const next = () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const int = (min: number, max: number) => min + Math.floor(next() * (max - min + 1));
  return { seed, next, int, pick: (items) => items[int(0, items.length - 1)]!, chance: (p) => next() < p };
}
