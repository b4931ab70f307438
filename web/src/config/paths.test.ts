import { describe, expect, it } from 'vitest';
import { homeFor, safeNext } from './paths';

describe('paths', () => {
  it('sends each role to its own start screen', () => {
    expect(homeFor('technician')).toBe('/today');
    expect(homeFor('office')).toBe('/jobs');
    expect(homeFor('admin')).toBe('/jobs');
  });

  it('follows only same-app paths after sign-in', () => {
    expect(safeNext('/team')).toBe('/team');
    expect(safeNext('//evil.example/x')).toBeNull();
    expect(safeNext('https://evil.example')).toBeNull();
    expect(safeNext('/sign-in?next=/x')).toBeNull();
    expect(safeNext(null)).toBeNull();
  });
});
