/**
 * The JSON the viewer reads from the server (server/app.ts lists the routes). The JSON is the
 * contract: these declarations mirror the server's result types (DESIGN.md §6 field names), and
 * test/web/json-contract.ts makes `npm run typecheck` fail if the two drift apart. The viewer
 * only draws these; no physics here.
 */

/** A scenario file as edited (DESIGN.md §5); kept as plain JSON so unknown sections survive edits. */
export type ScenarioJson = Record<string, unknown>;

export type Fate = 'target' | 'surface' | 'escaped' | 'trapped';

/** GET /api/scenarios */
export interface ScenarioList {
  default_id: string;
  scenarios: { id: string; name: string; description: string; valid: boolean }[];
  other_files: { id: string; problem: string }[];
}

/** GET /api/limits (the parts the viewer uses). */
export interface Limits {
  http: { rays_per_request: number; path_points: number; profile_heights: number };
  target_shapes: string[];
}

/** One level of POST /api/profile (server/service/profile.ts ProfileLevel). */
export interface ProfileLevel {
  height_m: number;
  temperature_C: number;
  pressure_hPa: number;
  refractive_index: number;
  refractivity_N: number;
  modified_refractivity_M: number;
  dn_dz_per_m: number;
  temperature_gradient_K_per_m: number;
}

/** POST /api/profile */
export interface ProfileResult {
  scenario: string;
  index_model: string;
  wavelength_nm: number;
  top_m: number;
  duct_threshold_dN_dz_per_m: number;
  levels: ProfileLevel[];
  warnings: string[];
}

/** One ray of POST /api/trace (server/service/trace.ts TracedRay). */
export interface TraceRay {
  elevation_deg: number;
  fate: Fate;
  height_at_target_m: number | null;
  end_range_m: number;
  end_height_m: number;
  path: [number, number][];
}

/** POST /api/trace: server/service/trace.ts TraceResult plus the fan the server used (null for explicit elevations). */
export interface TraceResult {
  scenario: string;
  range_m: number;
  observer_height_m: number;
  target_height_m: number;
  earth_radius_m: number;
  rays: TraceRay[];
  fates: Record<Fate, number>;
  fan: { from_deg: number; to_deg: number; count: number } | null;
  warnings: string[];
}

/** An image: a monotonic piece of the transfer curve (DESIGN.md §6 transfer.images). */
export interface TransferImage {
  from_height_m: number;
  to_height_m: number;
  from_elevation_deg: number;
  to_elevation_deg: number;
  orientation: 'erect' | 'inverted';
}

/** DESIGN.md §6 transfer. */
export interface TransferJson {
  range_m: number;
  /** Elevation window of the curve (findings only). */
  window?: { from_elevation_deg: number; to_elevation_deg: number };
  rays: { elevation_deg: number; height_m: number | null; fate: Fate }[];
  images: TransferImage[];
  lowest_visible_height_m: number | null;
  hidden_bands: { from_height_m: number; to_height_m: number }[];
}

/** The error body of every failed request. */
export interface ErrorJson {
  error: { field: string; message: string; problems: string[]; issues: { field: string; message: string }[] };
}

/** An image of the findings (server/service/transfer.ts ImageJson, the fields the viewer reads). */
export interface FindingsImage extends TransferImage {
  angular_extent_arcmin: number;
  resolvable?: boolean;
}

/** A comparison of the scene with a reference (looming / sinking, towering / stooping). */
export interface ComparisonJson {
  top_shift_arcmin: number | null;
  magnification_ratio: number | null;
  looming: 'looming' | 'sinking' | 'none' | null;
  towering: 'towering' | 'stooping' | 'none' | null;
}

/** POST /api/findings (server/service/findings.ts FindingsJson, the fields the viewer reads). */
export interface FindingsJson {
  scenario: string;
  observer_height_m: number;
  range_m: number;
  target_height_m: number;
  target_shape: string | null;
  index_model: string;
  horizon: {
    horizon_elevation_deg: number;
    dip_arcmin: number;
    horizon_distance_m: number | null;
    false_horizon: boolean;
    grazing_height_m: number;
    ducts: { bottom_m: number; top_m: number; surface_based: boolean }[];
    geometry: { dip_arcmin: number; horizon_distance_m: number };
  };
  transfer: TransferJson & { images: FindingsImage[]; looming: { standard: ComparisonJson | null; geometry: ComparisonJson | null } };
  visibility: {
    hidden_height_m: number;
    visible_fraction: number;
    image_count: number;
    status: 'visible' | 'partly-hidden' | 'hidden';
    images: FindingsImage[];
    hidden_bands: { from_height_m: number; to_height_m: number }[];
    resolution: { limit_arcmin: number; by: 'eye' | 'aperture'; visible_extent_arcmin: number; visible_resolvable: boolean; resolvable_image_count: number };
    compared: { geometry: { status: string; hidden_height_m: number } | null; standard: { status: string; hidden_height_m: number } | null };
  };
  refraction: { rows: { apparent_elevation_deg: number; refraction_arcmin: number | null }[] };
  caution: string;
  warnings: string[];
}

/** POST /api/view (server/service/view.ts ViewJson). */
export interface ViewJson {
  scenario: string;
  range_m: number;
  elevations_deg: number[];
  azimuths_deg: number[];
  classes: number[][];
  legend: string[];
  heights_at_target_m: (number | null)[];
  fates: Fate[];
  background: number[];
  horizon_elevation_deg: number;
  false_horizon: boolean;
  false_horizon_elevation_deg: number | null;
  silhouette: { shape: string; width_m: number; height_m: number; outline_m: [number, number][] };
  warnings: string[];
}
