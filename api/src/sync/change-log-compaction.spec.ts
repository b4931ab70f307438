import { afterEach, describe, expect, it, jest } from '@jest/globals';
import type { WriteQueue } from '../common/write-queue.js';
import { ChangeLogCompaction } from './change-log-compaction.js';

/** The schedule only: what a run removes is tested on both databases in test/change-log-compaction.e2e-spec.ts. */
describe('ChangeLogCompaction schedule', () => {
  afterEach(() => {
    jest.useRealTimers();
  });

  const scheduled = (compactionIntervalMinutes: number) => {
    const compaction = new ChangeLogCompaction({} as WriteQueue, { retentionDays: 90, compactionIntervalMinutes });
    const runs = jest.spyOn(compaction, 'compact').mockResolvedValue({ before: '', tombstones: 0, replayRecords: 0 });
    return { compaction, runs };
  };

  it('compacts every interval once the application has started, and stops with it', async () => {
    jest.useFakeTimers();
    const { compaction, runs } = scheduled(360);
    compaction.onApplicationBootstrap();
    jest.advanceTimersByTime(359 * 60_000);
    expect(runs).not.toHaveBeenCalled();
    jest.advanceTimersByTime(60_000);
    expect(runs).toHaveBeenCalledTimes(1);
    jest.advanceTimersByTime(720 * 60_000);
    expect(runs).toHaveBeenCalledTimes(3);
    await compaction.onModuleDestroy();
    jest.advanceTimersByTime(720 * 60_000);
    expect(runs).toHaveBeenCalledTimes(3);
  });

  it('never runs on its own with an interval of 0', () => {
    jest.useFakeTimers();
    const { compaction, runs } = scheduled(0);
    compaction.onApplicationBootstrap();
    jest.advanceTimersByTime(100 * 24 * 60 * 60_000);
    expect(runs).not.toHaveBeenCalled();
  });
});
