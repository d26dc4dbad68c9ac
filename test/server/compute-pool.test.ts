/** server/http/compute-pool.ts: computing in worker threads, with a time limit per request. */
import { describe, expect, it } from 'vitest';
import { createComputePool } from '../../server/http/compute-pool.js';
import { HttpError } from '../../server/http/errors.js';
import { scenarioFromJson } from '../../server/scenario/load.js';
import { INVERSION } from './fixtures.js';

const { scenario } = scenarioFromJson(INVERSION);

describe('createComputePool', () => {
  it('gives the same answer in a worker thread as in the main thread', async () => {
    const task = { kind: 'trace' as const, scenario, elevations_deg: [-0.1, 0, 0.1], fan: null, path_points: 5, max_steps: 20_000 };
    const threads = createComputePool(1, 30_000);
    const inline = createComputePool(0, 30_000);
    try {
      const [a, b] = await Promise.all([threads.run(task), inline.run(task)]);
      expect(a).toEqual(b);
      expect(a.ok).toBe(true);
    } finally {
      await threads.close();
    }
  });

  it('returns input problems as issues named as in the request body', async () => {
    const pool = createComputePool(0, 30_000);
    const answer = await pool.run({ kind: 'profile', scenario, heights_m: [0, 200_000] });
    expect(answer).toEqual({ ok: false, issues: [expect.objectContaining({ field: 'heights_m[1]' })] });
  });

  it('stops a computation that runs past the time limit and answers 503', async () => {
    // 2001 rays to 20 km take far longer than 1 ms on any machine.
    const pool = createComputePool(1, 1);
    try {
      const fan = { from_deg: -0.3, to_deg: 0.3, count: 2001 };
      const error = await pool.run({ kind: 'trace', scenario, elevations_deg: null, fan, path_points: 11, max_steps: 20_000 }).catch((e: unknown) => e);
      expect(error).toBeInstanceOf(HttpError);
      expect((error as HttpError).status).toBe(503);
      expect((error as HttpError).message).toMatch(/took longer than the server allows/);
    } finally {
      await pool.close();
    }
  });
});
