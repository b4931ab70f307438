import { describe, expect, it } from 'vitest';
import { dataSize } from './data-size';

describe('dataSize', () => {
  it('gives small sizes to a tenth of a megabyte, large ones in whole megabytes, and a phone’s quota in gigabytes', () => {
    expect(dataSize(0)).toBe('0.0 MB');
    expect(dataSize(20_000)).toBe('0.1 MB');
    expect(dataSize(3_140_000)).toBe('3.1 MB');
    expect(dataSize(38_400_000)).toBe('38 MB');
    // A browser's storage estimate: about 10.7 GB, not "10741 MB"
    expect(dataSize(10_741_000_000)).toBe('10.7 GB');
  });
});
