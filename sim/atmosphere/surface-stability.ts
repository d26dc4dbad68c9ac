/**
 * Monin-Obukhov stability functions ψ(ζ) of the COARE 3.0 / 3.5 bulk algorithm, ζ = z/L.
 *
 * Profiles in the surface layer are x(z) = x_s + (x_* / κ)[ln(z/z_0x) − ψ_x(z/L)], so ψ is the
 * departure from the logarithmic (neutral) profile: ψ > 0 in unstable air (ζ < 0), ψ < 0 in
 * stable air (ζ > 0), ψ(0) = 0.
 *
 * Unstable side: Fairall et al. (2003) blend a Kansas-type function ψ_K (Businger-Dyer form with
 * γ = 15) with a free-convection function ψ_C (Grachev, Fairall & Bradley 2000) so that
 * ψ = (1 − f) ψ_K + f ψ_C, f = ζ²/(1 + ζ²); "a_u = 10.15 and a_s = 34.15 gave the smoothest blend"
 * (Fairall et al. 2003, J. Climate 16, 571–590, section 2). Stable side: the Beljaars & Holtslag
 * (1991, J. Appl. Meteor. 30, 327–341) form with the COARE coefficients.
 *
 * The literals (0.3333 for the cube root, 0.6667, 14.28 and 8.525 in the stable heat function) are
 * those of the reference code, NOAA-PSL COARE-algorithm `Python/COARE3.5/meteo.py`, functions
 * `psit_26`, `psiu_26` and `psiu_40` (REFERENCES.md §7.2), kept so that results reproduce it.
 *
 * Kernels: total and cheap, no argument checks; any finite ζ is accepted. The exponential of the
 * stable branch is limited to e^−50 as in the reference code.
 */

const SQRT3 = Math.sqrt(3);

/** Cube-root exponent as written in the COARE reference code (0.3333, not 1/3). */
const CUBE_ROOT_EXPONENT = 0.3333;

/** Largest value of d·ζ in the stable exponential, as in the reference code (e^−50). */
const MAX_STABLE_EXPONENT = 50;

/** Blending weight of the convective function, f = ζ²/(1 + ζ²) (Fairall et al. 2003). */
function convectiveWeight(zeta: number): number {
  const z2 = zeta * zeta;
  return z2 / (1 + z2);
}

/**
 * Free-convection stability function of Grachev, Fairall & Bradley (2000) as used in COARE:
 * ψ_C = 1.5 ln((1 + y + y²)/3) − √3 arctan((1 + 2y)/√3) + π/√3, y = (1 − a ζ)^0.3333.
 */
function psiConvective(zeta: number, a: number): number {
  const y = Math.pow(1 - a * zeta, CUBE_ROOT_EXPONENT);
  return 1.5 * Math.log((1 + y + y * y) / 3) - SQRT3 * Math.atan((1 + 2 * y) / SQRT3) + Math.PI / SQRT3;
}

/** dψ_C/dζ: dψ_C/dy = 3y/(1 + y + y²), dy/dζ = −0.3333 a (1 − aζ)^(0.3333 − 1). */
function psiConvectiveDerivative(zeta: number, a: number): number {
  const base = 1 - a * zeta;
  const y = Math.pow(base, CUBE_ROOT_EXPONENT);
  const dy = -CUBE_ROOT_EXPONENT * a * Math.pow(base, CUBE_ROOT_EXPONENT - 1);
  return ((3 * y) / (1 + y + y * y)) * dy;
}

/** Kansas momentum function, x = (1 − γζ)^¼: 2 ln((1+x)/2) + ln((1+x²)/2) − 2 arctan x + π/2. */
function psiKansasMomentum(zeta: number, gamma: number): number {
  const x = Math.pow(1 - gamma * zeta, 0.25);
  return 2 * Math.log((1 + x) / 2) + Math.log((1 + x * x) / 2) - 2 * Math.atan(x) + Math.PI / 2;
}

/** Kansas heat function, x = (1 − γζ)^½: 2 ln((1 + x)/2). */
function psiKansasHeat(zeta: number, gamma: number): number {
  const x = Math.sqrt(1 - gamma * zeta);
  return 2 * Math.log((1 + x) / 2);
}

/** d/dζ of the Kansas heat function: −γ/(x(1 + x)). */
function psiKansasHeatDerivative(zeta: number, gamma: number): number {
  const x = Math.sqrt(1 - gamma * zeta);
  return -gamma / (x * (1 + x));
}

/** Stable momentum function −[aζ + b(ζ − c/d)e^{−dζ} + bc/d] with COARE's b = 3/4, c = 5, d = 0.35. */
function psiStableMomentum(zeta: number, a: number): number {
  const b = 0.75;
  const cOverD = 5 / 0.35;
  const e = Math.exp(-Math.min(0.35 * zeta, MAX_STABLE_EXPONENT));
  return -(a * zeta + b * (zeta - cOverD) * e + b * cOverD);
}

/**
 * COARE 3.0/3.5 stability function for momentum, `psiu_26`.
 * Unstable (ζ < 0): (1 − f) ψ_K + f ψ_C with ψ_K the Kansas momentum form, x = (1 − 15ζ)^¼, and
 * ψ_C with a_u = 10.15. Stable (ζ ≥ 0): −[0.7ζ + 0.75(ζ − 14.2857)e^{−0.35ζ} + 10.7143].
 * @param zeta stability parameter z/L, dimensionless, any finite value.
 * @returns ψ_m(ζ), dimensionless.
 * Accuracy: reproduces the reference code to rounding (psiu_26(1) = −4.3926, psiu_26(26) = −28.9153).
 * Reference: Fairall et al. (2003), J. Climate 16, 571–590, section 2; NOAA-PSL COARE-algorithm
 * `meteo.py` `psiu_26` (REFERENCES.md §7.2).
 */
export function psiMomentumCoare(zeta: number): number {
  if (zeta >= 0) return psiStableMomentum(zeta, 0.7);
  const f = convectiveWeight(zeta);
  return (1 - f) * psiKansasMomentum(zeta, 15) + f * psiConvective(zeta, 10.15);
}

/**
 * COARE momentum function `psiu_40`, used only for the first guess of the bulk iteration:
 * unstable Kansas form with γ = 18 blended with ψ_C (a = 10); stable Beljaars-Holtslag with a = 1.
 * @param zeta stability parameter z/L, dimensionless, any finite value.
 * @returns ψ_m(ζ), dimensionless.
 * Accuracy: reproduces the reference code (psiu_40(1) = −4.6926).
 * Reference: NOAA-PSL COARE-algorithm `Python/COARE3.5/meteo.py` `psiu_40` and its use in
 * `coare35vn.py` (REFERENCES.md §7.2).
 */
export function psiMomentumCoareFirstGuess(zeta: number): number {
  if (zeta >= 0) return psiStableMomentum(zeta, 1);
  const f = convectiveWeight(zeta);
  return (1 - f) * psiKansasMomentum(zeta, 18) + f * psiConvective(zeta, 10);
}

/**
 * COARE 3.0/3.5 stability function for heat and humidity (turbulent Prandtl number 1), `psit_26`.
 * Unstable (ζ < 0): (1 − f) ψ_K + f ψ_C, ψ_K = 2 ln((1 + (1 − 15ζ)^½)/2), ψ_C with a_s = 34.15.
 * Stable (ζ ≥ 0): −[(1 + 0.6667ζ)^1.5 + 0.6667(ζ − 14.28)e^{−0.35ζ} + 8.525].
 * @param zeta stability parameter z/L, dimensionless, any finite value.
 * @returns ψ_h(ζ), dimensionless.
 * Accuracy: reproduces the reference code (psit_26(1) = −4.4376, psit_26(26) = −87.03).
 * Reference: Fairall et al. (2003), J. Climate 16, 571–590, section 2 and Beljaars & Holtslag
 * (1991); NOAA-PSL COARE-algorithm `meteo.py` `psit_26` (REFERENCES.md §7.2).
 */
export function psiHeatCoare(zeta: number): number {
  if (zeta >= 0) {
    const e = Math.exp(-Math.min(0.35 * zeta, MAX_STABLE_EXPONENT));
    return -(Math.pow(1 + 0.6667 * zeta, 1.5) + 0.6667 * (zeta - 14.28) * e + 8.525);
  }
  const f = convectiveWeight(zeta);
  return (1 - f) * psiKansasHeat(zeta, 15) + f * psiConvective(zeta, 34.15);
}

/**
 * dψ_h/dζ of {@link psiHeatCoare}, analytic (for the temperature gradient of the surface layer:
 * dθ/dz = (θ_* / κ)[1/z − ψ_h'(z/L)/L]).
 * Unstable: ψ' = f'(ψ_C − ψ_K) + (1 − f)ψ_K' + fψ_C', f' = 2ζ/(1 + ζ²)².
 * Stable: ψ' = −[0.6667·1.5(1 + 0.6667ζ)^½ + 0.6667e^{−0.35ζ} − 0.35·0.6667(ζ − 14.28)e^{−0.35ζ}]
 * (the last term vanishes where the exponent is clamped, ζ > 50/0.35).
 * @param zeta stability parameter z/L, dimensionless, any finite value; at ζ = 0 the stable
 * (right) derivative −5.0 is returned (the unstable left limit is −7.5).
 * @returns dψ_h/dζ, dimensionless.
 * Accuracy: exact derivative of psiHeatCoare (checked against central differences in the tests).
 * Reference: derived from psit_26, NOAA-PSL COARE-algorithm `meteo.py` (REFERENCES.md §7.2).
 */
export function psiHeatCoareDerivative(zeta: number): number {
  if (zeta >= 0) {
    const clamped = 0.35 * zeta > MAX_STABLE_EXPONENT;
    const e = Math.exp(-Math.min(0.35 * zeta, MAX_STABLE_EXPONENT));
    const expTerm = 0.6667 * e - (clamped ? 0 : 0.35 * 0.6667 * (zeta - 14.28) * e);
    return -(1.5 * 0.6667 * Math.sqrt(1 + 0.6667 * zeta) + expTerm);
  }
  const f = convectiveWeight(zeta);
  const df = (2 * zeta) / ((1 + zeta * zeta) * (1 + zeta * zeta));
  const psiK = psiKansasHeat(zeta, 15);
  const psiC = psiConvective(zeta, 34.15);
  return df * (psiC - psiK) + (1 - f) * psiKansasHeatDerivative(zeta, 15) + f * psiConvectiveDerivative(zeta, 34.15);
}
