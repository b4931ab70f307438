import { describe, expect, it } from 'vitest';
import { homeFor, paths, safeNext } from './paths';

describe('paths', () => {
  it('sends each role to its own start screen', () => {
    expect(homeFor('technician')).toBe('/today');
    expect(homeFor('office')).toBe('/jobs');
    expect(homeFor('admin')).toBe('/jobs');
  });

  it("links to a job's tab and to the conflicts of one job", () => {
    expect(paths.job.href('0190a', 'cables')).toBe('/jobs/0190a?tab=cables');
    expect(paths.job.href('0190a')).toBe('/jobs/0190a');
    expect(paths.conflicts.href('0190a')).toBe('/conflicts?jobId=0190a');
    expect(paths.conflicts.href()).toBe('/conflicts');
  });

  it('follows only same-app paths after sign-in', () => {
    expect(safeNext('/team')).toBe('/team');
    expect(safeNext('//evil.example/x')).toBeNull();
    expect(safeNext('https://evil.example')).toBeNull();
    expect(safeNext('/sign-in?next=/x')).toBeNull();
    expect(safeNext(null)).toBeNull();
  });
});
