/**
 * A. T. Young's "zigzag" duct model (REFERENCES.md §6.1, from his web notes on ducts [read]): a
 * 15 °C standard atmosphere (6.5 K/km) with a 2 K inversion spread over 50..60 m. The inversion is
 * superposed on the standard profile (T(60 m) = T_std(60 m) + 2 K), as in Young's "Wegener" model
 * with the same 2° difference, which he says puts the duct bottom at the same height.
 */
import type { AtmosphereSpec } from '../../sim/scenario.js';
import { layeredAtmosphere } from './media.js';

/** Standard-lapse temperature at z for a 15 °C surface, °C (US 1976 troposphere, 6.5 K/km). */
const standard_C = (z_m: number): number => 15 - 0.0065 * z_m;

/** Young's zigzag model with an inversion of `step_K` over 50..60 m. */
export function youngZigzag(step_K = 2): AtmosphereSpec {
  return layeredAtmosphere(
    [
      [0, standard_C(0)],
      [50, standard_C(50)],
      [60, standard_C(60) + step_K],
    ],
    { kind: 'lapse', lapse_K_per_m: -0.0065 },
  );
}
