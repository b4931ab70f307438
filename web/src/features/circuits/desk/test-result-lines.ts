import { circuitReading, type CircuitTestLine, type ReadingField } from '@wiretrail/core';

/** The ring's r2 line also judges r1, which the line above it shows already. */
const SHOWN: Partial<Record<string, ReadingField[]>> = { 'ring-r2': ['r2Ohm'] };
const shown = (line: CircuitTestLine) => SHOWN[line.key] ?? line.fields;

/** What a line of a group is called beside its readings: their short names in the catalogue ("r1, rn", "L–E", "5×"). */
export const shortName = (line: CircuitTestLine) => shown(line).map((f) => circuitReading(f).short).join(', ');

const ANSWER_WORDS: Record<string, string> = { operates: 'trips', fails: 'does not trip', correct: 'correct', incorrect: 'incorrect' };

/** The readings a line shows beside its verdict, with the catalogue's units; answers in words. */
export function lineReadings(line: CircuitTestLine, result: { readonly [F in ReadingField]?: unknown }): string {
  const values = shown(line).map((f) => {
    const v = result[f];
    if (typeof v === 'string') return ANSWER_WORDS[v] ?? v;
    if (typeof v !== 'number') return '—';
    const { unit } = circuitReading(f);
    return unit ? `${v} ${unit}` : String(v);
  });
  return [...new Set(values)].join(', ');
}
