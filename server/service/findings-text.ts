/**
 * Readable text of the findings (the main job's output): one renderer per part, used by the CLI
 * commands and by `findings`, which joins them. Every text that shows a visibility verdict ends
 * with the safety caution.
 */
import { renderPairs, renderTable } from '../cli/table.js';
import type { FindingsJson } from './findings.js';
import type { HorizonJson } from './horizon.js';
import type { RefractionJson } from './refraction.js';
import type { ComparisonJson, ImageJson, TransferJson } from './transfer.js';
import type { VisibilityJson } from './visibility.js';

const fixed = (x: number, d: number): string => x.toFixed(d);
const signed = (x: number, d: number): string => `${x >= 0 ? '+' : '−'}${Math.abs(x).toFixed(d)}`;
const arcminText = (deg: number): string => `${signed(deg * 60, 2)}′`;
const km = (m: number): string => `${fixed(m / 1000, m < 10_000 ? 2 : 1)} km`;
const heights = (a: number, b: number): string => `${fixed(a, 2)}–${fixed(b, 2)} m`;

/** The `horizon` part. */
export function horizonText(h: HorizonJson): string {
  const where = h.false_horizon
    ? `false horizon: the top of a duct at ${fixed(h.grazing_height_m, 2)} m, not the sea's edge`
    : 'the sea’s edge';
  const pairs: [string, string | number | boolean | null][] = [
    ['apparent horizon', `${arcminText(h.horizon_elevation_deg)} (${h.horizon_elevation_deg < 0 ? 'below' : 'above'} the horizontal; ${where})`],
    ['dip', h.dip_arcmin >= 0 ? `${fixed(h.dip_arcmin, 3)}′` : `${signed(h.dip_arcmin, 3)}′ (the horizon is raised)`],
    ['distance to it', h.horizon_distance_m === null ? 'reached only asymptotically' : km(h.horizon_distance_m)],
    ['straight lines', `dip ${fixed(h.geometry.dip_arcmin, 3)}′, distance ${km(h.geometry.horizon_distance_m)}`],
    ['US 1976 air', h.standard ? `dip ${fixed(h.standard.dip_arcmin, 3)}′, distance ${h.standard.horizon_distance_m === null ? '—' : km(h.standard.horizon_distance_m)}` : '—'],
    ['trapped elevations', h.trapped_elevations ? `${arcminText(h.trapped_elevations.from_elevation_deg)} to ${arcminText(h.trapped_elevations.to_elevation_deg)}` : 'none'],
    ['ducts', h.ducts.length === 0 ? 'none' : h.ducts.map((d) => `${heights(d.bottom_m, d.top_m)}${d.surface_based ? ' (surface-based)' : ''}, ${fixed(d.depth_M, 2)} M`).join('; ')],
    ['checked by tracing', h.trace_check.confirmed ? 'yes (2″ below meets the sea, 2″ above does not)' : `no (below: ${h.trace_check.below_fate}, above: ${h.trace_check.above_fate})`],
  ];
  return ['Horizon', renderPairs(pairs)].join('\n');
}

/** Table of images. */
export function imagesTable(images: readonly (ImageJson & { resolvable?: boolean })[]): string {
  if (images.length === 0) return 'no image of any height up to the maximum';
  return renderTable(
    images.map((image, i) => ({ i: i + 1, ...image })),
    [
      { header: '#', value: (r) => r.i },
      { header: 'image', value: (r) => r.orientation },
      { header: 'heights m', value: (r) => heights(r.from_height_m, r.to_height_m) },
      { header: 'seen at', value: (r) => `${arcminText(r.from_elevation_deg)} to ${arcminText(r.to_elevation_deg)}` },
      { header: 'size ′', value: (r) => r.angular_extent_arcmin, decimals: 3 },
      { header: 'vs straight', value: (r) => (r.relative_magnification === null ? null : `×${r.relative_magnification.toFixed(2)}`) },
      ...(images.some((i) => i.resolvable !== undefined) ? [{ header: 'resolvable', value: (r: { resolvable?: boolean }) => (r.resolvable ? 'yes' : 'no') }] : []),
    ],
  );
}

function comparisonLine(name: string, c: ComparisonJson | null): string {
  if (!c) return `${name}: —`;
  const shift = c.top_shift_arcmin === null ? 'top not seen in both' : `top ${signed(c.top_shift_arcmin, 2)}′ (${c.looming})`;
  const mag = c.magnification_ratio === null ? 'magnification —' : `magnification ×${c.magnification_ratio.toFixed(3)} (${c.towering})`;
  return `${name}: ${shift}, ${mag}`;
}

/** The `transfer` part. */
export function transferText(t: TransferJson): string {
  return [
    `At the target range (${km(t.range_m)}), heights 0–${fixed(t.max_height_m, 2)} m`,
    imagesTable(t.images),
    `lowest visible height: ${t.lowest_visible_height_m === null ? 'none seen' : `${fixed(t.lowest_visible_height_m, 2)} m`}`,
    `hidden bands: ${t.hidden_bands.length === 0 ? 'none' : t.hidden_bands.map((b) => heights(b.from_height_m, b.to_height_m)).join(', ')}`,
    comparisonLine('against US 1976 air', t.looming.standard),
    comparisonLine('against straight lines', t.looming.geometry),
    `(${t.rays.length} rays kept of ${t.rays_traced} traced; window ${arcminText(t.window.from_elevation_deg)} to ${arcminText(t.window.to_elevation_deg)})`,
  ].join('\n');
}

function verdictLine(v: { status: string; hidden_height_m: number; visible_fraction: number; image_count: number }): string {
  return `${v.status}: ${fixed(100 * v.visible_fraction, 1)} % of its height seen, ${v.image_count} image${v.image_count === 1 ? '' : 's'}, hidden below ${fixed(v.hidden_height_m, 2)} m`;
}

/** The `visibility` part (ends with the caution). */
export function visibilityText(v: VisibilityJson): string {
  const r = v.resolution;
  const by = r.by === 'eye' ? `the unaided eye (${fixed(r.limit_arcmin, 2)}′)` : `a ${fixed(r.aperture_mm!, 0)} mm aperture (${fixed(r.limit_arcmin * 60, 2)}″)`;
  return [
    `Visibility of the target (${fixed(v.target_height_m, 2)} m at ${km(v.range_m)})`,
    verdictLine(v),
    `hidden bands: ${v.hidden_bands.length === 0 ? 'none' : v.hidden_bands.map((b) => heights(b.from_height_m, b.to_height_m)).join(', ')}`,
    imagesTable(v.images),
    `resolution by ${by}: the visible part spans ${fixed(r.visible_extent_arcmin, 3)}′ (${r.visible_resolvable ? 'resolvable' : 'not resolvable'}), ${r.resolvable_image_count} of ${v.image_count} images resolvable`,
    `with straight lines: ${v.compared.geometry ? verdictLine(v.compared.geometry) : '—'}`,
    `in US 1976 air:      ${v.compared.standard ? verdictLine(v.compared.standard) : '—'}`,
    '',
    `Caution: ${v.caution}`,
  ].join('\n');
}

/** The `refraction` part. */
export function refractionText(r: RefractionJson): string {
  const lines = [
    `Astronomical refraction (observer at ${fixed(r.observer_height_m, 2)} m; apparent horizon ${arcminText(r.horizon_elevation_deg)})`,
    renderTable(r.rows, [
      { header: 'apparent °', value: (x) => x.apparent_elevation_deg },
      { header: 'refraction ′', value: (x) => x.refraction_arcmin, decimals: 3 },
      { header: 'true °', value: (x) => x.true_elevation_deg, decimals: 4 },
    ]),
  ];
  if (r.bodies.length > 0) {
    lines.push(
      renderTable(r.bodies, [
        { header: 'body true °', value: (b) => b.true_elevation_deg },
        { header: 'upper limb °', value: (b) => b.upper_limb_elevation_deg, decimals: 4 },
        { header: 'lower limb °', value: (b) => b.lower_limb_elevation_deg, decimals: 4 },
        { header: 'flattening', value: (b) => b.flattening, decimals: 3 },
        { header: 'above horizon', value: (b) => (b.above_horizon ? 'yes' : 'no') },
      ]),
    );
  }
  return lines.join('\n');
}

/** Warnings as lines. */
export function warningLines(warnings: readonly string[]): string[] {
  return warnings.map((w) => `warning: ${w}`);
}

/** The whole findings text. */
export function findingsText(f: FindingsJson): string {
  const model = f.index_model === 'radio' || f.index_model === 'none' ? f.index_model : `${f.index_model}, ${Math.round(f.wavelength_nm)} nm`;
  return [
    f.scenario,
    ...(f.description ? [f.description] : []),
    `observer at ${fixed(f.observer_height_m, 2)} m; target ${fixed(f.target_height_m, 2)} m high${f.target_shape ? ` (${f.target_shape})` : ''} at ${km(f.range_m)}; index model ${model}`,
    '',
    horizonText(f.horizon),
    '',
    transferText(f.transfer),
    '',
    refractionText(f.refraction),
    '',
    visibilityText(f.visibility),
    ...warningLines(f.warnings),
  ].join('\n');
}
