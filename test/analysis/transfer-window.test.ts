import { describe, expect, it } from 'vitest';
import { RangeProbe } from '../../sim/analysis/range-probe.js';
import { transferWindow, WINDOW_MARGIN_MIN_RAD } from '../../sim/analysis/transfer-window.js';
import { standardAtmosphere, tableOf } from './media.js';
import { inferiorMirage, superiorMirage } from './mirage-media.js';

describe('the elevation window of the transfer curve', () => {
  const cases = [
    ['US 1976 air, 12 m, 30 km, 40 m target', { table: tableOf(standardAtmosphere(15)), observer_m: 12, range_m: 30_000, top_m: 40 }],
    ['an inferior mirage, 1.6 m, 2.5 km, 4 m target', inferiorMirage(4)],
    ['a superior mirage, 3 m inside a duct, 20 km, 26 m target', superiorMirage()],
  ] as const;
  for (const [name, c] of cases) {
    it(`starts with a ray that meets the surface and ends with one that passes above the top (${name})`, () => {
      const probe = new RangeProbe(c.table, c.observer_m, c.range_m, 6_371_000);
      const w = transferWindow(probe, c.top_m);
      expect(w.to_rad - w.from_rad).toBeGreaterThan(2 * WINDOW_MARGIN_MIN_RAD);
      expect(probe.probe(w.from_rad).fate).toBe('surface');
      const top = probe.probe(w.to_rad);
      expect(top.fate === 'escaped' || (top.height_m ?? -1) > c.top_m).toBe(true);
      // It always reaches above the horizontal (downward rays may turn up in the air below the eye).
      expect(w.to_rad).toBeGreaterThan(0);
    });
  }
});
