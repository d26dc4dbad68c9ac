/**
 * The integrator's own points along one ray (accepted steps and located events), with the slopes
 * that make a cubic Hermite interpolant between them, and resampling of that interpolant at
 * uniform range spacing for display. Resampled values between knots are accurate to O(h⁴) of the
 * step h: good for plots, not for analysis (analysis asks the tracer for exact values).
 */
import { hermiteValue } from './hermite.js';

/** Growable knot arrays, reused from ray to ray (no allocation once large enough). */
export class KnotBuffer {
  count = 0;
  range_m: Float64Array = new Float64Array(64);
  height_m: Float64Array = new Float64Array(64);
  elevation_rad: Float64Array = new Float64Array(64);
  /** dz/ds at the knot. */
  heightRate: Float64Array = new Float64Array(64);
  /** dα/ds arriving at the knot (from the previous step's side of a kink), rad/m. */
  elevationRateIn: Float64Array = new Float64Array(64);
  /** dα/ds leaving the knot, rad/m. */
  elevationRateOut: Float64Array = new Float64Array(64);

  clear(): void {
    this.count = 0;
  }

  push(range_m: number, height_m: number, elevation_rad: number, heightRate: number, rateIn: number, rateOut: number): void {
    if (this.count === this.range_m.length) this.grow();
    const k = this.count++;
    this.range_m[k] = range_m;
    this.height_m[k] = height_m;
    this.elevation_rad[k] = elevation_rad;
    this.heightRate[k] = heightRate;
    this.elevationRateIn[k] = rateIn;
    this.elevationRateOut[k] = rateOut;
  }

  /** Appends every knot of other. */
  append(other: KnotBuffer): void {
    for (let k = 0; k < other.count; k++) {
      this.push(other.range_m[k], other.height_m[k], other.elevation_rad[k], other.heightRate[k], other.elevationRateIn[k], other.elevationRateOut[k]);
    }
  }

  private grow(): void {
    const size = this.range_m.length * 2;
    const widen = (a: Float64Array): Float64Array => {
      const b = new Float64Array(size);
      b.set(a);
      return b;
    };
    this.range_m = widen(this.range_m);
    this.height_m = widen(this.height_m);
    this.elevation_rad = widen(this.elevation_rad);
    this.heightRate = widen(this.heightRate);
    this.elevationRateIn = widen(this.elevationRateIn);
    this.elevationRateOut = widen(this.elevationRateOut);
  }
}

/**
 * Writes samples of one ray (knots first .. first + count − 1 of the buffer) at ranges j·spacing
 * (j = 0, 1, … while below the last knot) and one at the last knot, as [range_m, height_m,
 * elevation_rad] triples into out from offset on. Returns the number of samples written: at most
 * maxSamples (the caller chooses a spacing that leaves room for the last knot).
 */
export function resampleKnots(knots: KnotBuffer, first: number, count: number, spacing_m: number, maxSamples: number, out: Float64Array, offset: number): number {
  const n = first + count;
  const s = knots.range_m;
  const z = knots.height_m;
  const a = knots.elevation_rad;
  const end = s[n - 1];
  let k = first;
  let written = 0;
  for (let j = 0; written < maxSamples - 1; j++) {
    const sj = j * spacing_m;
    if (!(sj < end)) break;
    while (k < n - 2 && s[k + 1] <= sj) k++;
    const o = offset + 3 * written++;
    if (count === 1 || s[k + 1] === s[k]) {
      out[o] = sj;
      out[o + 1] = z[k];
      out[o + 2] = a[k];
      continue;
    }
    out[o] = sj;
    out[o + 1] = hermiteValue(s[k], z[k], knots.heightRate[k], s[k + 1], z[k + 1], knots.heightRate[k + 1], sj);
    out[o + 2] = hermiteValue(s[k], a[k], knots.elevationRateOut[k], s[k + 1], a[k + 1], knots.elevationRateIn[k + 1], sj);
  }
  const o = offset + 3 * written++;
  out[o] = end;
  out[o + 1] = z[n - 1];
  out[o + 2] = a[n - 1];
  return written;
}

/** Copies the knots themselves as [range, height, elevation] columns (no resampling). */
export function knotColumns(knots: KnotBuffer): { range_m: Float64Array; height_m: Float64Array; elevation_rad: Float64Array } {
  const n = knots.count;
  return {
    range_m: knots.range_m.slice(0, n),
    height_m: knots.height_m.slice(0, n),
    elevation_rad: knots.elevation_rad.slice(0, n),
  };
}
