import { describe, expect, it } from 'vitest';
import { EYE_RESOLUTION_RAD, RAYLEIGH_COEFFICIENT, isResolvable, rayleighLimit_rad } from '../../sim/analysis/resolution.js';
import { InputRangeError } from '../../sim/errors.js';
import { expectClose } from '../support/close.js';

const ARCSEC = Math.PI / 180 / 3600;

describe('Rayleigh resolution limit', () => {
  it('uses the coefficient 1.21967 (first zero of J1 over pi)', () => {
    // REFERENCES.md §8: 3.831706/π = 1.2196699 [read-2nd + computed]; 7 digits are printed there.
    expectClose(RAYLEIGH_COEFFICIENT, 1.2196699, { abs: 1e-7 });
  });

  // REFERENCES.md §8 table [computed there from 1.21967 λ/D]; the table prints 4-5 significant
  // digits, so the tolerance is half a unit of the last printed digit.
  const rows: [number, number, number, number][] = [
    // wavelength nm, aperture mm, want, half a unit of the last digit (arcsec)
    [550, 3, 46.12, 0.005],
    [550, 7, 19.77, 0.005],
    [550, 50, 2.767, 0.0005],
    [550, 100, 1.384, 0.0005],
    [550, 200, 0.692, 0.0005],
    [633, 100, 1.592, 0.0005],
  ];
  for (const [nm, mm, want, tol] of rows) {
    it(`gives ${want}″ for ${nm} nm through a ${mm} mm aperture (REFERENCES.md §8)`, () => {
      expectClose(rayleighLimit_rad(nm / 1000, mm / 1000) / ARCSEC, want, { abs: tol });
    });
  }

  it('gives 2.2361e-4 rad for a 3 mm daylight pupil at 550 nm (REFERENCES.md §8)', () => {
    expectClose(rayleighLimit_rad(0.55, 0.003), 2.2361e-4, { abs: 0.00005e-4 });
  });

  it('rejects a zero aperture and a wavelength outside 0.1..1e7 µm, naming the field', () => {
    expect(() => rayleighLimit_rad(0.55, 0)).toThrow(InputRangeError);
    expect(() => rayleighLimit_rad(0.55, 0)).toThrow(/aperture_m/);
    expect(() => rayleighLimit_rad(Number.NaN, 0.1)).toThrow(/wavelength_um/);
  });
});

describe('whether an extent is resolvable', () => {
  it('takes 1 arcmin as the unaided eye limit (common practice, no source)', () => {
    expectClose(EYE_RESOLUTION_RAD, 2.908882e-4, { abs: 1e-10 }); // 1′ in rad, REFERENCES.md §8 [computed]
    expect(isResolvable(1.01 * EYE_RESOLUTION_RAD, { wavelength_um: 0.55 })).toBe(true);
    expect(isResolvable(0.99 * EYE_RESOLUTION_RAD, { wavelength_um: 0.55 })).toBe(false);
  });

  it('resolves 2″ with a 100 mm aperture but not with the eye', () => {
    // 100 mm at 550 nm resolves 1.384″ (REFERENCES.md §8).
    expect(isResolvable(2 * ARCSEC, { wavelength_um: 0.55, aperture_m: 0.1 })).toBe(true);
    expect(isResolvable(1.3 * ARCSEC, { wavelength_um: 0.55, aperture_m: 0.1 })).toBe(false);
    expect(isResolvable(2 * ARCSEC, { wavelength_um: 0.55 })).toBe(false);
  });

  it('rejects a negative extent, naming extent_rad', () => {
    expect(() => isResolvable(-1e-6, { wavelength_um: 0.55 })).toThrow(/extent_rad/);
  });
});
