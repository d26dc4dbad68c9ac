import { describe, expect, it } from 'vitest';
import { sampleInputs } from '../../sim/analysis/ensemble-sampling.js';
import { summariseEnsemble, type MemberFindings, type MemberRecord } from '../../sim/analysis/ensemble-summary.js';
import { expectClose } from '../support/close.js';

/** A member whose hidden height is a given function of its inputs (a 10 m target). */
function member(values: number[], hidden: (v: number[]) => number): MemberRecord {
  const h = Math.max(0, Math.min(10, hidden(values)));
  const findings: MemberFindings = {
    status: h === 0 ? 'visible' : h >= 10 ? 'hidden' : 'partly-hidden',
    hidden_height_m: h,
    visible_fraction: 1 - h / 10,
    image_count: h >= 10 ? 0 : 1,
    horizon_elevation_rad: -0.001,
    top_elevation_rad: h >= 10 ? null : 0.0001 * (10 - h),
  };
  return { values, findings };
}

describe('summariseEnsemble', () => {
  it('ranks first the input built to dominate, and gives the sign of its effect', () => {
    // Hidden height = 4·x0 − 0.3·x1 + 0.05·x2 with three inputs of equal spread: x0 dominates.
    const values = sampleInputs(
      [
        { kind: 'uniform', min: 0, max: 2 },
        { kind: 'uniform', min: 0, max: 2 },
        { kind: 'uniform', min: 0, max: 2 },
      ],
      300,
      17,
      'latin-hypercube',
    );
    const s = summariseEnsemble(values.map((v) => member(v, (x) => 1 + 4 * x[0] - 0.3 * x[1] + 0.05 * x[2])), 3);
    expect(s.sensitivity.map((x) => x.input)).toEqual([0, 1, 2]);
    expect(s.sensitivity[0].rho).toBeGreaterThan(0.9);
    expect(s.sensitivity[1].rho).toBeLessThan(0);
    expect(s.sensitivity_output).toBe('hidden_fraction');
  });

  it('counts statuses into probabilities with binomial standard errors and leaves failed members out', () => {
    const records: MemberRecord[] = [
      member([0], () => 0),
      member([1], () => 0),
      member([2], () => 5),
      member([3], () => 20),
      { values: [4], findings: null },
    ];
    const s = summariseEnsemble(records, 1);
    expect(s.members).toBe(4);
    expect(s.failed).toBe(1);
    expectClose(s.probabilities, { visible: 0.5, partly_hidden: 0.25, hidden: 0.25 }, { abs: 1e-15 });
    expectClose(s.standard_errors, { visible: Math.sqrt(0.25 / 4), partly_hidden: Math.sqrt(0.1875 / 4), hidden: Math.sqrt(0.1875 / 4) }, { abs: 1e-15 });
    expectClose(s.hidden_height_m, { p5: 0, p50: 2.5, p95: 9.25 }, { abs: 1e-12 });
  });

  it('falls back to the top elevation when the hidden fraction never changes', () => {
    const records = [0, 1, 2, 3].map((x) => ({ ...member([x], () => 0), findings: { ...member([x], () => 0).findings!, top_elevation_rad: 0.001 * x } }));
    const s = summariseEnsemble(records, 1);
    expect(s.sensitivity_output).toBe('top_elevation_rad');
    expect(s.sensitivity[0].rho).toBe(1);
  });

  it('gives zero probabilities and no percentiles when nothing finished', () => {
    const s = summariseEnsemble([{ values: [1], findings: null }], 1);
    expect(s.probabilities).toEqual({ visible: 0, partly_hidden: 0, hidden: 0 });
    expect(s.hidden_height_m).toBeNull();
    expect(s.sensitivity).toEqual([{ input: 0, score: 0, rho: null }]);
  });
});
