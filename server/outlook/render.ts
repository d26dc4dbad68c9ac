/** The outlook as text: a readable table for the terminal, and CSV. */
import type { OutlookResult } from '../service/outlook.js';
import { renderTable } from '../cli/table.js';
import type { OutlookRowJson } from './rows.js';

/** Columns of the CSV output, in order: the DESIGN.md §6 fields first, then the extras. */
export const OUTLOOK_CSV_COLUMNS = [
  'time',
  'stability',
  'horizon_shift_arcmin',
  'landmark_shift_arcmin',
  'landmark_magnification',
  'image_count',
  'false_horizon',
  'label',
  'strength',
  'line',
  'resolvable_image_count',
  'obukhov_length_m',
  'air_sea_difference_K',
  'horizon_elevation_arcmin',
  'landmark_elevation_arcmin',
  'lowest_visible_height_m',
  'reference_lowest_visible_height_m',
  'hidden_bands',
] as const satisfies readonly (keyof OutlookRowJson)[];

/**
 * A CSV field: numbers to 6 significant digits, null empty, height bands as "from-to" pairs in m
 * joined by ";", text quoted when it holds a comma, quote or line break.
 */
function csvField(value: unknown): string {
  if (value === null || value === undefined) return '';
  if (Array.isArray(value)) {
    return (value as { from_height_m: number; to_height_m: number }[]).map((b) => `${csvField(b.from_height_m)}-${csvField(b.to_height_m)}`).join(';');
  }
  if (typeof value === 'number') return Number.isFinite(value) ? String(Number(value.toPrecision(6))) : '';
  const text = String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** The rows as CSV (header line, one line per row, trailing newline). */
export function outlookCsv(result: OutlookResult): string {
  const lines = [OUTLOOK_CSV_COLUMNS.join(',')];
  for (const row of result.rows) lines.push(OUTLOOK_CSV_COLUMNS.map((c) => csvField(row[c])).join(','));
  return lines.join('\n') + '\n';
}

/** The outlook as a readable text table, with the site above and the notes below. */
export function outlookText(result: OutlookResult, caution: string): string {
  const s = result.site;
  const landmark = `${s.landmark.name ?? 'landmark'}: ${(s.landmark.range_m / 1000).toFixed(1)} km away, ${s.landmark.height_m} m high`;
  const table = renderTable(result.rows, [
    { header: 'time', value: (r) => r.time },
    { header: 'stability', value: (r) => r.stability },
    { header: 'L m', value: (r) => r.obukhov_length_m, digits: 3 },
    { header: 'air−sea K', value: (r) => r.air_sea_difference_K, decimals: 1 },
    { header: 'horizon ′', value: (r) => r.horizon_shift_arcmin, decimals: 2 },
    { header: 'landmark ′', value: (r) => r.landmark_shift_arcmin, decimals: 2 },
    { header: 'magnif.', value: (r) => r.landmark_magnification, decimals: 2 },
    { header: 'images', value: (r) => `${r.resolvable_image_count}/${r.image_count}` },
    { header: 'seen from m', value: (r) => r.lowest_visible_height_m, decimals: 1 },
    { header: 'strength', value: (r) => r.strength, decimals: 2 },
    { header: 'label', value: (r) => r.label },
  ]);
  return [
    `${s.name} — eye ${s.observer_height_m} m above the sea; ${landmark}`,
    `Shifts in arcminutes against the ${result.reference}; positive: seen higher.`,
    `magnif.: vertical magnification at the landmark's top (> 1 taller); images: told apart (taller than the resolving limit) / all; seen from: lowest height on the landmark that is seen.`,
    '',
    table,
    '',
    ...result.warnings.map((w) => `warning: ${w}`),
    ...groupedNotes(result.rows),
    caution,
  ].join('\n');
}

/** Row warnings grouped by their wording (numbers aside): one line each, with the rows' count and the first example. */
export function groupedNotes(rows: readonly OutlookRowJson[]): string[] {
  const groups = new Map<string, { count: number; example: string }>();
  for (const row of rows) {
    for (const warning of new Set(row.warnings)) {
      const key = warning.replace(/-?\d+(\.\d+)?/g, '#');
      const group = groups.get(key);
      if (group) group.count++;
      else groups.set(key, { count: 1, example: `${row.time}: ${warning}` });
    }
  }
  return [...groups.values()].map((g) => `note (${g.count} row${g.count > 1 ? 's' : ''}), e.g. ${g.example}`);
}
