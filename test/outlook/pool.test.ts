import { describe, expect, it } from 'vitest';
import { computeFindings, POOL_MIN_ROWS, workerCount } from '../../server/outlook/pool.js';
import { observation, TEST_SITE as SITE } from './fixtures.js';

const obs = (air_C: number, sea_C: number) => observation(air_C, sea_C, 6, 0.8);

describe('computing outlook rows', () => {
  it('uses one thread for short series and every core for long ones when left to choose', () => {
    expect(workerCount('auto', POOL_MIN_ROWS - 1)).toBe(1);
    expect(workerCount('auto', POOL_MIN_ROWS)).toBeGreaterThanOrEqual(1);
    expect(workerCount(4, 2)).toBe(2);
    expect(workerCount(1, 100)).toBe(1);
  });

  it('gives the same findings, in order, from two worker threads as from this thread, reporting progress', async () => {
    const observations = [obs(14, 10), obs(10, 10.1), obs(8, 12)];
    const progress: number[] = [];
    const here = await computeFindings(observations, SITE, { workers: 1, onProgress: (done) => progress.push(done) });
    const pooled = await computeFindings(observations, SITE, { workers: 2 });
    expect(progress).toEqual([1, 2, 3]);
    // Structured cloning between threads must not change a single bit.
    expect(JSON.stringify(pooled)).toBe(JSON.stringify(here));
    expect(here.map((f) => Math.sign(f.horizon_shift_rad))).toEqual([1, -1, -1]);
  });
});
