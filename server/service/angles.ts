/** Angle units at the edge (DESIGN.md §6 JSON speaks degrees and arcminutes; sim/ speaks radians). */
import { RAD_PER_ARCMIN, RAD_PER_DEG } from '../../sim/constants.js';

/** Radians to degrees. */
export function deg(rad: number): number {
  return rad / RAD_PER_DEG;
}

/** Radians to arcminutes. */
export function arcmin(rad: number): number {
  return rad / RAD_PER_ARCMIN;
}

/** Radians to degrees, keeping null. */
export function degOrNull(rad: number | null): number | null {
  return rad === null ? null : deg(rad);
}

/** Radians to arcminutes, keeping null. */
export function arcminOrNull(rad: number | null): number | null {
  return rad === null ? null : arcmin(rad);
}
