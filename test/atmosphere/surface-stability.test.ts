import { describe, expect, it } from 'vitest';
import {
  psiHeatCoare,
  psiHeatCoareDerivative,
  psiMomentumCoare,
  psiMomentumCoareFirstGuess,
} from '../../sim/atmosphere/surface-stability.js';
import { expectClose } from '../support/close.js';

/** The meteo.py comments print 4 decimals (5 significant digits): half a unit of the last digit, dimensionless. */
const READ_4DP_ABS = 0.5e-4;
/** psit_26(26) is printed as −87.03 (2 decimals): half a unit of the last digit, dimensionless. */
const READ_2DP_ABS = 0.5e-2;
/** REFERENCES.md [computed] values carry 5 decimals: half a unit of the last digit, dimensionless. */
const COMPUTED_5DP_ABS = 0.5e-5;
/** Central-difference derivative with h = 1e-6: truncation plus rounding error well below 1e-6. */
const DERIVATIVE_ABS = 1e-6;

describe('COARE stability functions against the reference code', () => {
  // Source: NOAA-PSL COARE-algorithm Python/COARE3.5/meteo.py, test comments ("MATLAB result"),
  // as read in REFERENCES.md §7.2.
  it('psit_26(1) is −4.4376 as printed in the meteo.py test comments', () => {
    expectClose(psiHeatCoare(1), -4.4376, { abs: READ_4DP_ABS });
  });
  it('psiu_26(1) and psiu_26(26) are −4.3926 and −28.9153 as printed in the meteo.py test comments', () => {
    expectClose([psiMomentumCoare(1), psiMomentumCoare(26)], [-4.3926, -28.9153], { abs: READ_4DP_ABS });
  });
  it('psiu_40(1) is −4.6926 as printed in the meteo.py test comments', () => {
    expectClose(psiMomentumCoareFirstGuess(1), -4.6926, { abs: READ_4DP_ABS });
  });
  it('psit_26(26) is −87.03 as printed in the meteo.py test comments', () => {
    expectClose(psiHeatCoare(26), -87.03, { abs: READ_2DP_ABS });
  });
});

describe('COARE stability functions against independent computation (REFERENCES.md §7.2 [computed])', () => {
  // Independent computation (REFERENCES.md §7.2, "More values [computed]"), functions of
  // Fairall et al. 2003 as coded in NOAA-PSL COARE-algorithm meteo.py.
  it('psit_26 on the unstable side matches 0.51127, 1.86536, 3.12684 at ζ = −0.1, −1, −5', () => {
    expectClose([-0.1, -1, -5].map(psiHeatCoare), [0.51127, 1.86536, 3.12684], { abs: COMPUTED_5DP_ABS });
  });
  it('psiu_26 on the unstable side matches 0.27006, 1.11042, 2.17480 at ζ = −0.1, −1, −5', () => {
    expectClose([-0.1, -1, -5].map(psiMomentumCoare), [0.27006, 1.11042, 2.1748], { abs: COMPUTED_5DP_ABS });
  });
  it('psit_26 on the stable side matches −0.49801, −2.35243, −8.02380 at ζ = 0.1, 0.5, 2', () => {
    expectClose([0.1, 0.5, 2].map(psiHeatCoare), [-0.49801, -2.35243, -8.0238], { abs: COMPUTED_5DP_ABS });
  });
});

describe('COARE stability functions: properties', () => {
  it('are positive in unstable air and negative in stable air', () => {
    for (const zeta of [-20, -3, -0.5, -0.01]) {
      expect(psiHeatCoare(zeta)).toBeGreaterThan(0);
      expect(psiMomentumCoare(zeta)).toBeGreaterThan(0);
    }
    for (const zeta of [0.01, 0.5, 3, 20, 500]) {
      expect(psiHeatCoare(zeta)).toBeLessThan(0);
      expect(psiMomentumCoare(zeta)).toBeLessThan(0);
    }
  });
  it('vanish at ζ = 0 for momentum, and for heat up to the −0.004524 left by the rounded literals of psit_26', () => {
    // −(1 − 0.6667·14.28 + 8.525) = −0.004524 (literals of meteo.py psit_26, REFERENCES.md §7.2);
    // 1e-12: rounding of a few double operations.
    expectClose(psiMomentumCoare(0), 0, { abs: 1e-12 });
    expectClose(psiHeatCoare(0), -0.004524, { abs: 1e-12 });
    expectClose(psiHeatCoare(-1e-9), 0, { abs: 1e-7 });
  });
  it('have an analytic heat derivative equal to a central difference on both sides and in the clamped tail', () => {
    const h = 1e-6;
    for (const zeta of [-30, -5, -1, -0.1, -0.001, 0.001, 0.1, 1.5, 6, 40, 200]) {
      const numeric = (psiHeatCoare(zeta + h) - psiHeatCoare(zeta - h)) / (2 * h);
      expectClose(psiHeatCoareDerivative(zeta), numeric, { abs: DERIVATIVE_ABS, rel: DERIVATIVE_ABS });
    }
  });
  it('approach the Kansas slopes −7.5 (unstable) and −5.0 (stable) of the heat function at ζ → 0', () => {
    // ψ_K' = −15/(x(1+x)) → −7.5; stable: −[1 + 0.6667 + 0.35·0.6667·14.28] = −4.9989 (derived).
    expectClose(psiHeatCoareDerivative(-1e-9), -7.5, { abs: 1e-6 });
    expectClose(psiHeatCoareDerivative(0), -(1.5 * 0.6667 + 0.6667 + 0.35 * 0.6667 * 14.28), { abs: 1e-12 });
  });
});
