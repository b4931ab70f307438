import { describe, expect, it } from 'vitest';
import { CIRCUIT_KINDS, PROTECTIVE_DEVICES } from '../sync/entities.js';
import { CIRCUIT_KIND_WORDS, circuitKindWords, deviceAndRating, PROTECTIVE_DEVICE_WORDS } from './circuit-words.js';

describe('circuit words', () => {
  it('names every kind and every protective device the registry allows, each differently', () => {
    expect(Object.keys(CIRCUIT_KIND_WORDS).sort()).toEqual([...CIRCUIT_KINDS].sort());
    expect(Object.keys(PROTECTIVE_DEVICE_WORDS).sort()).toEqual([...PROTECTIVE_DEVICES].sort());
    const devices = Object.values(PROTECTIVE_DEVICE_WORDS);
    expect(new Set(devices).size).toBe(devices.length);
  });

  it('calls a rewirable fuse by its standard and its trade name', () => {
    expect(PROTECTIVE_DEVICE_WORDS['BS 3036']).toBe('BS 3036 semi-enclosed fuse');
    expect(PROTECTIVE_DEVICE_WORDS.B).toBe('Type B circuit-breaker');
  });

  it('shows a kind it does not know as written, and none as a dash', () => {
    expect(circuitKindWords('ring')).toBe('Ring final');
    expect(circuitKindWords('spur')).toBe('spur');
    expect(circuitKindWords(null)).toBe('—');
  });

  it('gives a device with its rating, and says when the rating is missing', () => {
    expect(deviceAndRating({ deviceType: 'B', deviceRatingA: 32 })).toBe('Type B 32 A');
    expect(deviceAndRating({ deviceType: 'BS 88-3', deviceRatingA: 30 })).toBe('BS 88-3 30 A');
    expect(deviceAndRating({ deviceType: 'C', deviceRatingA: null })).toBe('Type C ? A');
    expect(deviceAndRating({ deviceType: null, deviceRatingA: 32 })).toBe('—');
  });
});
