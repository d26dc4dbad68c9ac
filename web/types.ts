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
  rays: { elevation_deg: number; height_m: number | null; fate: Fate }[];
  images: TransferImage[];
  lowest_visible_height_m: number | null;
  hidden_bands: { from_height_m: number; to_height_m: number }[];
}

/** The error body of every failed request. */
export interface ErrorJson {
  error: { field: string; message: string; problems: string[]; issues: { field: string; message: string }[] };
}
