import { describe, expect, it } from 'vitest';
import { findDucts } from '../../sim/analysis/ducts.js';
import { InvariantProfile } from '../../sim/analysis/invariant.js';
import { expectClose } from '../support/close.js';
import { R_TEST_M } from './analytic-media.js';
import { standardAtmosphere, tableOf } from './media.js';
import { youngZigzag } from './young.js';

/** Young gives the duct bottom as "about 45.3 m"; REFERENCES.md §6.1 suggests ±0.1 m (its own reproduction: 45.35 m). */
const DUCT_BOTTOM_TOLERANCE_M = 0.1;

describe('ducts from the invariant n·r', () => {
  it("puts the bottom of Young's zigzag duct at 45.3 m (A. T. Young, duct notes, as read in REFERENCES.md §6.1)", () => {
    const ducts = findDucts(new InvariantProfile(tableOf(youngZigzag()), R_TEST_M));
    expect(ducts.length).toBe(1);
    expectClose(ducts[0].bottom_m, 45.3, { abs: DUCT_BOTTOM_TOLERANCE_M });
    // Independent computation (REFERENCES.md §6.1 [computed]): 45.35 m; the table's chain agrees to 1 cm.
    expectClose(ducts[0].bottom_m, 45.35, { abs: 0.01 });
    expect(ducts[0].top_m).toBe(60); // top of the trapping layer = top of the inversion (a kink)
    expect(ducts[0].trapping_layer_bottom_m).toBe(50);
    expect(ducts[0].surface_based).toBe(false);
  });

  it('finds no duct in the US 1976 standard atmosphere (its ray curvature is about 1/6 of the Earth’s, REFERENCES.md §5.1)', () => {
    expect(findDucts(new InvariantProfile(tableOf(standardAtmosphere(15)), R_TEST_M))).toEqual([]);
  });

  it('calls a duct surface-based when n·r at its top is below its value at the sea', () => {
    // A 10 K inversion over 50..60 m: n·r falls by about 51 m across it (more than the 41 m it gained below).
    const [duct] = findDucts(new InvariantProfile(tableOf(youngZigzag(10)), R_TEST_M));
    expect(duct.surface_based).toBe(true);
    expect(duct.bottom_m).toBe(0);
    expect(duct.top_m).toBe(60);
  });
});
