import { describe, expect, it } from 'vitest';
import { goldenMaximum, illinoisRoot } from '../../sim/analysis/roots.js';
import { expectClose } from '../support/close.js';

describe('the Illinois root finder', () => {
  it('finds the cube root of 2 as the root of x³ − 2 on [1, 2] to 1e-12 (exact value 2^(1/3))', () => {
    let calls = 0;
    const f = (x: number): number => {
      calls++;
      return x * x * x - 2;
    };
    const [x] = illinoisRoot(f, 1, 2, f(1), f(2), 1e-14);
    expectClose(x, Math.cbrt(2), { abs: 1e-12 });
    // Superlinear: far fewer evaluations than the 47 bisection would need.
    expect(calls).toBeLessThan(20);
  });

  it('returns an end of the bracket that is already a root', () => {
    expect(illinoisRoot((x) => x, 0, 1, 0, 1, 1e-9)).toEqual([0, 0]);
  });
});

describe('the golden-section search', () => {
  it('finds the top of a parabola, −(x − 0.3)², to within the tolerance asked', () => {
    const [x, fx] = goldenMaximum((x) => -((x - 0.3) ** 2), -1, 2, 1e-9);
    expectClose(x, 0.3, { abs: 1e-8 });
    expect(fx).toBeLessThanOrEqual(0);
    expect(fx).toBeGreaterThan(-1e-15);
  });
});
