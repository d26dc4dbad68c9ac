/**
 * Limits of the HTTP API: each request is bounded in size and in work, so one client cannot hold
 * the server (which computes on its event loop) for long. Every limit is a named constant with its
 * unit; a request beyond one gets 400 naming the field and the allowed range (413 for the body size).
 * The numbers are served at GET /api/limits so the viewer can respect them.
 */
import { MAX_PROFILE_NODES } from '../scenario/schema.js';

export const HTTP_LIMITS = Object.freeze({
  /** Largest request body, bytes (256 KiB). A scenario with the file format's 500 nodes is about 30 KiB. */
  body_bytes: 256 * 1024,
  /** Most rays in one trace request (`elevations_deg` or `fan.count`). */
  rays_per_request: 2001,
  /** Most points per ray path in a trace response (`path_points`). */
  path_points: 1001,
  /**
   * Most path points in one trace response (rays × path_points): bounds the response at about
   * 8 MB of JSON.
   */
  path_points_per_request: 400_000,
  /** Farthest target range accepted by the server, m (the file format allows 1 000 km; the CLI does too). */
  range_m: 500_000,
  /** Most temperature nodes in a scenario's profile: the file format's own limit. */
  profile_nodes: MAX_PROFILE_NODES,
  /** Most heights in one profile request (`heights_m`). */
  profile_heights: 2001,
  /**
   * Work per trace request: rays × target range, in ray·km. 501 rays to 200 km, or 2001 rays to
   * 100 km, fit; a ray costs about 0.1–0.3 ms per 50 km in the layered media of profiles/.
   */
  ray_km_per_request: 200_000,
  /** Most integrator steps per ray in HTTP traces (the tracer's own default is 100 000). */
  steps_per_ray: 20_000,
  /** Most elevations in a refraction list sent to findings (`refraction_elevations_deg`). */
  refraction_elevations: 100,
  /** Most bodies (Sun, Moon: true elevations) in one findings request (`bodies_deg`). */
  bodies: 10,
  /** Most rays of the first fan of a findings request's transfer curve (`rays`; it refines itself beyond). */
  transfer_rays: 2001,
  /** Most cells of a simulated view (`rows` × `columns`); a cell costs no ray, a row costs one. */
  view_cells: 250_000,
  /** Most rows or columns of a simulated view. */
  view_side: 1000,
  /**
   * Longest computation of one request, ms. Past it the worker computing it is stopped and the
   * answer is 503 (only with a worker pool; without one the limits above bound the work).
   */
  compute_ms: 30_000,
});

export type HttpLimits = typeof HTTP_LIMITS;
