/**
 * Cool skin of the ocean: the sub-millimetre layer at the surface that is cooler than the water
 * below by about 0.1–0.5 K because it loses heat by long-wave radiation and turbulent fluxes
 * while conduction alone carries heat up through it. COARE 3.5 form (Fairall et al. 1996; 2003).
 *
 * Numerical kernel: no argument checks (computeBulkFlux validates its inputs).
 * Reference code: NOAA-PSL COARE-algorithm `Python/COARE3.5/coare35vn.py`, the cool-skin block of
 * the bulk loop (REFERENCES.md §7.3, §7.4). Paper: C. W. Fairall, E. F. Bradley, J. S. Godfrey,
 * G. A. Wick, J. B. Edson, G. S. Young (1996), "Cool-skin and warm-layer effects on sea surface
 * temperature", J. Geophys. Res. 101(C1), 1295–1308 (journal details from memory).
 */
import { CELSIUS_OFFSET_K } from '../constants.js';

/** Stefan-Boltzmann constant as written in the COARE code, W/(m² K⁴) (CODATA: 5.670374e-8). */
const STEFAN_BOLTZMANN_COARE = 5.67e-8;
/** Long-wave emissivity of the sea surface, dimensionless. COARE 3.5 code (0.97). */
const SEA_EMISSIVITY = 0.97;
/** Short-wave albedo correction, dimensionless: net = 0.945 × downward. COARE 3.5 code. */
const SHORTWAVE_NET_FRACTION = 0.945;
/** Specific heat of sea water, J/(kg K). COARE 3.5 code (cpw = 4000). */
const WATER_SPECIFIC_HEAT = 4000;
/** Density of sea water, kg/m³. COARE 3.5 code (rhow = 1022). */
const WATER_DENSITY = 1022;
/** Kinematic viscosity of sea water, m²/s. COARE 3.5 code (visw = 1e-6). */
const WATER_VISCOSITY = 1e-6;
/** Thermal conductivity of sea water, W/(m K). COARE 3.5 code (tcw = 0.6). */
const WATER_CONDUCTIVITY = 0.6;
/** Saline contraction coefficient factor, dimensionless. COARE 3.5 code (be = 0.026). */
const SALINE_EXPANSION = 0.026;
/** Saunders constant in the sublayer thickness, dimensionless. COARE 3.5 code (xlamx = 6). */
const SAUNDERS = 6;
/** Largest sublayer thickness, m. COARE 3.5 code (0.01). */
const MAX_THICKNESS_M = 0.01;

/** Fixed surroundings of the cool skin during one bulk iteration. */
export interface CoolSkinSetup {
  /** Bulk sea temperature (a few metres down), K. */
  sea_temperature_K: number;
  /** Moist air density at the measurement height, kg/m³. */
  air_density_kg_per_m3: number;
  /** Latent heat of vaporisation at the sea temperature, J/kg. */
  latent_heat_J_per_kg: number;
  /** Downward short-wave radiation, W/m². */
  shortwave_down_W_per_m2: number;
  /** Downward long-wave radiation, W/m². */
  longwave_down_W_per_m2: number;
  /** Gravity, m/s². */
  gravity_m_per_s2: number;
  /** Clausius-Clapeyron slope of the sea-surface humidity, d q_s/dT, 1/K (COARE `wetc`). */
  humidity_slope_per_K: number;
}

/** State of the cool skin. */
export interface CoolSkin {
  /** Skin temperature below the bulk sea temperature, K (COARE `dter`). */
  depression_K: number;
  /** Corresponding drop of the sea-surface specific humidity, kg/kg (COARE `dqer`). */
  humidity_depression: number;
  /** Thickness of the conductive sublayer, m (COARE `tkt`). */
  thickness_m: number;
}

/** The first guess of the COARE code: 0.3 K depression, 1 mm thickness. */
export function initialCoolSkin(setup: CoolSkinSetup): CoolSkin {
  return { depression_K: 0.3, humidity_depression: setup.humidity_slope_per_K * 0.3, thickness_m: 0.001 };
}

/**
 * One update of the cool skin from the current turbulent fluxes (one pass of the COARE loop).
 * Net heat loss q_col = R_nl + H_s + H_l − (absorbed short-wave in the sublayer); the sublayer
 * thickness δ = λ ν_w/(√(ρ_a/ρ_w) u*) with Saunders' λ reduced by buoyancy; ΔT = q_col δ/k_w.
 * @param setup fixed surroundings (see CoolSkinSetup).
 * @param previous cool skin of the previous pass (its depression sets the emitted long-wave).
 * @param friction_velocity_m_s u*, m/s (> 0).
 * @param sensible_up_W_per_m2 sensible heat flux from sea to air, W/m² (positive upward).
 * @param latent_up_W_per_m2 latent heat flux from sea to air, W/m² (positive upward).
 * @returns the updated cool skin; depression positive when the skin is cooler than the bulk.
 * Accuracy: reproduces the reference code; row 1 of the COARE 3.5 test data gives 0.3109 K.
 * Reference: Fairall et al. (1996), eqs. as coded in NOAA-PSL COARE-algorithm `coare35vn.py`.
 */
export function updateCoolSkin(
  setup: CoolSkinSetup,
  previous: CoolSkin,
  friction_velocity_m_s: number,
  sensible_up_W_per_m2: number,
  latent_up_W_per_m2: number,
): CoolSkin {
  const skin_K = setup.sea_temperature_K - previous.depression_K;
  const netLongwave = SEA_EMISSIVITY * (STEFAN_BOLTZMANN_COARE * skin_K ** 4 - setup.longwave_down_W_per_m2);
  const netShortwave = SHORTWAVE_NET_FRACTION * setup.shortwave_down_W_per_m2;
  const tkt = previous.thickness_m;
  const absorbed = netShortwave * (0.065 + 11 * tkt - (6.6e-5 / tkt) * (1 - Math.exp(-tkt / 8.0e-4)));
  const qcol = netLongwave + sensible_up_W_per_m2 + latent_up_W_per_m2 - absorbed;
  const t_C = setup.sea_temperature_K - CELSIUS_OFFSET_K;
  const thermalExpansion = 2.1e-5 * Math.pow(t_C + 3.2, 0.79);
  const alq = thermalExpansion * qcol + (SALINE_EXPANSION * latent_up_W_per_m2 * WATER_SPECIFIC_HEAT) / setup.latent_heat_J_per_kg;
  const u = friction_velocity_m_s;
  const densityFactor = Math.sqrt(setup.air_density_kg_per_m3 / WATER_DENSITY);
  let thickness_m: number;
  if (alq > 0) {
    const bigc =
      (16 * setup.gravity_m_per_s2 * WATER_SPECIFIC_HEAT * (WATER_DENSITY * WATER_VISCOSITY) ** 3) /
      (WATER_CONDUCTIVITY ** 2 * setup.air_density_kg_per_m3 ** 2);
    const lambda = SAUNDERS / Math.pow(1 + Math.pow((bigc * alq) / u ** 4, 0.75), 0.333);
    thickness_m = (lambda * WATER_VISCOSITY) / (densityFactor * u);
  } else {
    thickness_m = Math.min(MAX_THICKNESS_M, (SAUNDERS * WATER_VISCOSITY) / (densityFactor * u));
  }
  const depression_K = (qcol * thickness_m) / WATER_CONDUCTIVITY;
  return { depression_K, humidity_depression: setup.humidity_slope_per_K * depression_K, thickness_m };
}
