/**
 * Angular resolution: whether an angular extent (an image, a gap between images, a hidden band)
 * can be resolved by the unaided eye or by an instrument of a given aperture (DESIGN.md §7).
 */
import { InputRangeError, requireInRange } from '../errors.js';

/**
 * Rayleigh coefficient: the first zero of the Bessel function J₁ divided by π,
 * j₁,₁/π = 3.8317059702075123/π = 1.2196698912665045 (dimensionless).
 * Source: Airy pattern of a circular aperture, first dark ring at sin θ = j₁,₁ λ/(π D)
 * (Born & Wolf, Principles of Optics, §8.5.2, from memory); j₁,₁ = 3.8317059702075123
 * (Abramowitz & Stegun, Table 9.5, from memory); REFERENCES.md §8 quotes 1.21967 [read-2nd + computed].
 */
export const RAYLEIGH_COEFFICIENT = 3.8317059702075123 / Math.PI;

/** Resolving limit of the unaided eye, rad: 1 arcmin (common practice, no source; REFERENCES.md §8). */
export const EYE_RESOLUTION_RAD = Math.PI / 180 / 60;

/** Allowed wavelengths, µm (from the ultraviolet to the radio; the Rayleigh formula holds for any). */
export const WAVELENGTH_RANGE_UM = { min: 0.1, max: 1e7 } as const;

/**
 * Rayleigh resolution limit of a circular aperture: θ = 1.21967 λ/D (small-angle form).
 * @param wavelength_um vacuum wavelength, µm (0.1..1e7).
 * @param aperture_m aperture diameter, m (> 0).
 * @returns limiting angular separation, rad (550 nm, 100 mm: 6.708e-6 rad = 1.384″).
 *   Exact for the diffraction-limited circular aperture in the small-angle form; seeing,
 *   aberrations and the detector are not included.
 * @throws InputRangeError naming wavelength_um or aperture_m.
 * Reference: Rayleigh criterion with the Airy first zero, REFERENCES.md §8.
 */
export function rayleighLimit_rad(wavelength_um: number, aperture_m: number): number {
  requireInRange('wavelength_um', wavelength_um, WAVELENGTH_RANGE_UM.min, WAVELENGTH_RANGE_UM.max, 'µm');
  if (typeof aperture_m !== 'number' || !Number.isFinite(aperture_m) || !(aperture_m > 0)) {
    throw new InputRangeError('aperture_m', aperture_m, '> 0 m');
  }
  return (RAYLEIGH_COEFFICIENT * wavelength_um * 1e-6) / aperture_m;
}

/** Viewing conditions: wavelength, and an instrument's aperture (absent: the unaided eye). */
export interface Viewing {
  /** Vacuum wavelength, µm (0.1..1e7). */
  wavelength_um: number;
  /** Aperture diameter of an instrument, m (> 0); absent for the unaided eye. */
  aperture_m?: number;
}

/**
 * The resolving limit for the viewing conditions: the Rayleigh limit of the aperture if one is
 * given, else the eye's 1 arcmin.
 * @returns limit, rad.
 * @throws InputRangeError naming wavelength_um or aperture_m.
 */
export function resolvingLimit_rad(viewing: Viewing): number {
  if (viewing.aperture_m === undefined) {
    requireInRange('wavelength_um', viewing.wavelength_um, WAVELENGTH_RANGE_UM.min, WAVELENGTH_RANGE_UM.max, 'µm');
    return EYE_RESOLUTION_RAD;
  }
  return rayleighLimit_rad(viewing.wavelength_um, viewing.aperture_m);
}

/**
 * Whether an angular extent can be resolved: extent ≥ the resolving limit (Rayleigh for an
 * aperture, 1 arcmin for the eye). An extent exactly at the limit counts as resolved.
 * @param extent_rad angular extent, rad (≥ 0).
 * @param viewing wavelength and optional aperture.
 * @returns true when resolvable.
 * @throws InputRangeError naming extent_rad, wavelength_um or aperture_m.
 */
export function isResolvable(extent_rad: number, viewing: Viewing): boolean {
  requireInRange('extent_rad', extent_rad, 0, 2 * Math.PI, 'rad');
  return extent_rad >= resolvingLimit_rad(viewing);
}
