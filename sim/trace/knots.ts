/**
 * The integrator's own points along one ray (accepted steps and located events), with the slopes
 * that make a cubic Hermite interpolant between them, and resampling of that interpolant at
 * uniform range spacing for display. Resampled values between knots are accurate to O(h⁴) of the
 * step h: good for plots, not for analysis (analysis asks the tracer for exact values).
 */
/** Growable knot arrays, reused from ray to ray (no allocation once large enough). */
export class KnotBuffer {
  count = 0;
  range_m: Float64Array;
  height_m: Float64Array;
  elevation_rad: Float64Array;
  /** dz/ds at the knot. */
  heightRate: Float64Array;
  /** dα/ds arriving at the knot (from the previous step's side of a kink), rad/m. */
  elevationRateIn: Float64Array;
  /** dα/ds leaving the knot, rad/m. */
  elevationRateOut: Float64Array;

  /** @param capacity initial number of knots (the buffer doubles when full). */
  constructor(capacity = 64) {
    const size = Math.max(2, Math.ceil(capacity));
    this.range_m = new Float64Array(size);
    this.height_m = new Float64Array(size);
    this.elevation_rad = new Float64Array(size);
    this.heightRate = new Float64Array(size);
    this.elevationRateIn = new Float64Array(size);
    this.elevationRateOut = new Float64Array(size);
  }

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
    const n = other.count;
    while (this.count + n > this.range_m.length) this.grow();
    const at = this.count;
    for (let k = 0; k < n; k++) {
      this.range_m[at + k] = other.range_m[k];
      this.height_m[at + k] = other.height_m[k];
      this.elevation_rad[at + k] = other.elevation_rad[k];
      this.heightRate[at + k] = other.heightRate[k];
      this.elevationRateIn[at + k] = other.elevationRateIn[k];
      this.elevationRateOut[at + k] = other.elevationRateOut[k];
    }
    this.count += n;
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
  const last = first + count - 1;
  const s = knots.range_m;
  const z = knots.height_m;
  const a = knots.elevation_rad;
  const end = s[last];
  let written = 0;
  let j = 0;
  // Interval by interval: the cubic's power-basis coefficients in t = (range − s_k)/h once,
  // then Horner for every sample that falls in it.
  for (let k = first; k < last && written < maxSamples - 1; k++) {
    const s0 = s[k];
    const h = s[k + 1] - s0;
    if (!(h > 0)) continue;
    const invH = 1 / h;
    const dz = z[k + 1] - z[k];
    const mz0 = knots.heightRate[k] * h;
    const mz1 = knots.heightRate[k + 1] * h;
    const z2 = 3 * dz - 2 * mz0 - mz1;
    const z3 = mz0 + mz1 - 2 * dz;
    const da = a[k + 1] - a[k];
    const ma0 = knots.elevationRateOut[k] * h;
    const ma1 = knots.elevationRateIn[k + 1] * h;
    const a2 = 3 * da - 2 * ma0 - ma1;
    const a3 = ma0 + ma1 - 2 * da;
    const limit = k + 1 === last ? end : s[k + 1];
    for (let sj = j * spacing_m; sj < limit && written < maxSamples - 1; sj = ++j * spacing_m) {
      const t = (sj - s0) * invH;
      const o = offset + 3 * written++;
      out[o] = sj;
      out[o + 1] = z[k] + t * (mz0 + t * (z2 + t * z3));
      out[o + 2] = a[k] + t * (ma0 + t * (a2 + t * a3));
    }
  }
  const o = offset + 3 * written++;
  out[o] = end;
  out[o + 1] = z[last];
  out[o + 2] = a[last];
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
