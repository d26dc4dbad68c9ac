/**
 * Adaptive Gauss–Kronrod quadrature (7-point Gauss, 15-point Kronrod), the QUADPACK rule QK15:
 * Piessens, de Doncker-Kapenga, Überhuber & Kahaner (1983), QUADPACK, Springer, §2.2 and routine
 * QK15 (nodes and weights below as printed there). Intervals whose Kronrod and Gauss estimates
 * differ by more than the tolerance are halved, down to a fixed depth.
 */

/** Kronrod abscissae on [−1, 1] (non-negative half; index 7 is the centre). */
const XGK = [
  0.991455371120812639206854697526329, 0.949107912342758524526189684047851,
  0.864864423359769072789712788640926, 0.741531185599394439863864773280788,
  0.586087235467691130294144845693013, 0.405845151377397166906606412076961,
  0.207784955007898467600689403773245, 0.0,
];
/** Kronrod weights for XGK. */
const WGK = [
  0.022935322010529224963732008058970, 0.063092092629978553290700663189204,
  0.104790010322250183839876322541518, 0.140653259715525918745189590510238,
  0.169004726639267902826583426598550, 0.190350578064785409913256402421014,
  0.204432940075298892414161999234649, 0.209482141084727828012999174891714,
];
/** Gauss weights for the abscissae XGK[1], XGK[3], XGK[5], XGK[7]. */
const WG = [
  0.129484966168869693270611432679082, 0.279705391489276667901467771423780,
  0.381830050505118944950369775488975, 0.417959183673469387755102040816327,
];

/** Most panels per integral; the worst panel is halved until the summed error meets the tolerance or this many panels exist. */
const MAX_PANELS = 2000;

/** One QK15 panel: Kronrod estimate and |Kronrod − Gauss|. */
function panel(f: (x: number) => number, a: number, b: number, out: Float64Array): void {
  const centre = 0.5 * (a + b);
  const half = 0.5 * (b - a);
  const fc = f(centre);
  let kronrod = fc * WGK[7];
  let gauss = fc * WG[3];
  for (let j = 0; j < 7; j++) {
    const dx = half * XGK[j];
    const sum = f(centre - dx) + f(centre + dx);
    kronrod += WGK[j] * sum;
    if (j % 2 === 1) gauss += WG[(j - 1) >> 1] * sum;
  }
  out[0] = kronrod * half;
  out[1] = Math.abs((kronrod - gauss) * half);
}

/**
 * ∫_a^b f(x) dx by globally adaptive QK15 (as QUADPACK's QAG): the panel with the largest error
 * estimate is halved until the summed estimate is at most tolerance, or MAX_PANELS panels exist.
 * @param f integrand, evaluated only strictly inside [a, b] (so an integrable endpoint singularity is allowed).
 * @param tolerance absolute error wanted (the summed |K − G|, a pessimistic bound for K).
 * @returns the integral; accuracy about tolerance for integrands smooth on each panel.
 */
export function integrateAdaptive(f: (x: number) => number, a: number, b: number, tolerance: number): number {
  const out = new Float64Array(2);
  const lo: number[] = [a];
  const hi: number[] = [b];
  const value: number[] = [];
  const error: number[] = [];
  panel(f, a, b, out);
  value.push(out[0]);
  error.push(out[1]);
  let total = out[0];
  let totalError = out[1];
  while (totalError > tolerance && lo.length < MAX_PANELS) {
    let worst = 0;
    for (let i = 1; i < error.length; i++) if (error[i] > error[worst]) worst = i;
    const l = lo[worst];
    const h = hi[worst];
    const mid = 0.5 * (l + h);
    if (mid === l || mid === h) break;
    total -= value[worst];
    totalError -= error[worst];
    panel(f, l, mid, out);
    hi[worst] = mid;
    value[worst] = out[0];
    error[worst] = out[1];
    total += out[0];
    totalError += out[1];
    panel(f, mid, h, out);
    lo.push(mid);
    hi.push(h);
    value.push(out[0]);
    error.push(out[1]);
    total += out[0];
    totalError += out[1];
  }
  return total;
}
