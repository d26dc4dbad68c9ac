import { describe, it } from 'vitest';
import {
  enhancementFactor,
  saturationVapourPressure_Pa,
  saturationVapourPressureIapws_Pa,
  saturationVapourPressureOverIceIapws_Pa,
  saturationVapourPressureOverWaterIapws_Pa,
  vapourMoleFraction,
  vapourPressureFromRelativeHumidity_Pa,
} from '../../sim/refractivity/water-vapour.js';
import { expectClose } from '../support/close.js';

/** Pa. REFERENCES.md §1.2 quotes the check values to 0.001 Pa; allow one unit of the last digit. */
const SVP_TOL_PA = 0.001;
/** Relative. IF97 verification values are printed to 9 significant digits. */
const IF97_TOL_REL = 1e-8;
/** Dimensionless. The enhancement factor is a 3-term polynomial; round-off only. */
const F_TOL = 1e-12;

describe('saturation vapour pressure', () => {
  it("gives 2339.163 Pa at 20 °C with Ciddor's BIPM-81 form", () => {
    // REFERENCES.md §1.2, BIPM-81 value at 20 °C: independent computation.
    expectClose(saturationVapourPressure_Pa(293.15), 2339.163, { abs: SVP_TOL_PA });
  });

  it('gives 2339.215 Pa at 20 °C over water with IAPWS-IF97', () => {
    // REFERENCES.md §1.2 check value: independent computation.
    expectClose(saturationVapourPressureOverWaterIapws_Pa(293.15), 2339.215, { abs: SVP_TOL_PA });
  });

  it('matches the IAPWS-IF97 saturation-pressure verification values at 300, 500 and 600 K', () => {
    // IAPWS-IF97, verification table for the region-4 saturation pressure: from memory
    // (0.353658941e-2, 0.263889776e1, 0.123443146e2 MPa); the 20 °C value above is the sourced check.
    expectClose(
      [300, 500, 600].map(saturationVapourPressureOverWaterIapws_Pa),
      [3536.58941, 2638897.76, 12344314.6],
      { rel: IF97_TOL_REL },
    );
  });

  it('gives 259.904 Pa over ice at −10 °C', () => {
    // REFERENCES.md §1.2 ice check value: independent computation.
    expectClose(saturationVapourPressureOverIceIapws_Pa(263.15), 259.904, { abs: SVP_TOL_PA });
  });

  it('switches from water to ice at 0 °C as NIST does', () => {
    // NIST EMT Appendix A-I (REFERENCES.md §1.2): water for t ≥ 0 °C, ice below.
    expectClose(saturationVapourPressureIapws_Pa(273.15), saturationVapourPressureOverWaterIapws_Pa(273.15), { rel: 1e-15 });
    expectClose(saturationVapourPressureIapws_Pa(263.15), saturationVapourPressureOverIceIapws_Pa(263.15), { rel: 1e-15 });
  });

  it('gives the triple-point pressure of the ice formula, 611.657 Pa, from the water formula at 273.16 K', () => {
    // Triple-point pressure 611.657 Pa: the reference pressure of NIST's ice formula (REFERENCES.md §1.2).
    // Tolerance 0.01 %: two independent fits meeting at one point (common practice, no source).
    expectClose(saturationVapourPressureOverWaterIapws_Pa(273.16), 611.657, { rel: 1e-4 });
  });
});

describe('enhancement factor and mole fraction', () => {
  it('multiplies γ by t squared, giving 1.004025605 at 20 °C and 101 325 Pa', () => {
    // Ciddor 1996 Appendix A, f = 1.00062 + 3.14e-8 p + 5.6e-7 t² (REFERENCES.md §1.1 step 6):
    // 1.00062 + 0.003181605 + 0.000224 = 1.004025605. With the γ·t bug it would be 1.003812805.
    expectClose(enhancementFactor(101_325, 293.15), 1.004025605, { abs: F_TOL });
  });

  it('turns 50 % relative humidity at 20 °C into half the saturation pressure, without enhancement', () => {
    // Definition of relative humidity (Ciddor 1996 Appendix A: x_w = f·RH·svp/p, f applied later).
    expectClose(vapourPressureFromRelativeHumidity_Pa(0.5, 293.15), 2339.163 / 2, { abs: SVP_TOL_PA });
  });

  it('gives the mole fraction f·e/p', () => {
    // Ciddor 1996 Appendix A: x_w = f·p_v/p; 1.004025605 × 1000 / 101325 = 0.0099089623.
    expectClose(vapourMoleFraction({ temperature_K: 293.15, pressure_Pa: 101_325, vapour_pressure_Pa: 1000 }), 0.0099089623, {
      rel: 1e-9,
    });
  });
});
