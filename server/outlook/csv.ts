/**
 * The outlook's series file: a CSV of routine marine observations, one row per time, with a header
 * whose column names carry their units.
 *
 *   # lines starting with "#" are comments (say where the data come from); blank lines are skipped
 *   time,air_temperature_C,sea_temperature_C,wind_speed_m_s,relative_humidity_pct,pressure_hPa
 *   2031-06-14T13:00+01:00,19.4,10.2,3.1,64,1016.2
 *
 * - `time`: ISO 8601 date and time (`YYYY-MM-DDThh:mm[:ss[.s]]` with an optional `Z` or `±hh:mm`),
 *   strictly later than the row before; kept as written in the output.
 * - `air_temperature_C` (−40..45 °C), `sea_temperature_C` (−2.5..40 °C), `wind_speed_m_s`
 *   (0..40 m/s), `pressure_hPa` (surface pressure, 500..1100 hPa): the ranges of the scenario file
 *   (server/scenario/schema.ts LIMITS).
 * - Relative humidity over water, either as `relative_humidity_pct` (0..100 %) or as
 *   `relative_humidity` (a fraction 0..1, as in the scenario file): exactly one of the two.
 * Columns may come in any order; every one is required; a column not listed is an error naming it.
 * A value that is missing, not a number or out of range makes its row bad; bad rows are reported
 * by line number (the file's own line, comments and header counted) and field.
 */
import { LIMITS } from '../scenario/schema.js';
import { describeBadRow, SeriesError, type BadRow } from './errors.js';

/** One good row, in file units except humidity (always a fraction). */
export interface SeriesRow {
  /** Line of the row in the file, 1-based. */
  line: number;
  /** The time as written (ISO 8601). */
  time: string;
  /** The time as milliseconds since 1970 (the zone as written; local time when none is written). */
  time_ms: number;
  air_temperature_C: number;
  sea_temperature_C: number;
  wind_speed_m_s: number;
  /** Relative humidity over water, 0..1. */
  relative_humidity: number;
  pressure_hPa: number;
}

/** A read series: the good rows and every bad one. */
export interface ParsedSeries {
  rows: SeriesRow[];
  bad: BadRow[];
  /** The humidity column the file used. */
  humidity_column: 'relative_humidity_pct' | 'relative_humidity';
}

type NumericField = 'air_temperature_C' | 'sea_temperature_C' | 'wind_speed_m_s' | 'relative_humidity' | 'pressure_hPa';

/** Numeric columns: the row field they fill, their allowed range and unit, and a scale to the field's unit. */
const NUMERIC_COLUMNS: Record<string, { field: NumericField; min: number; max: number; unit: string; scale: number }> = {
  air_temperature_C: { field: 'air_temperature_C', ...range('air_temperature_C'), scale: 1 },
  sea_temperature_C: { field: 'sea_temperature_C', ...range('sea_temperature_C'), scale: 1 },
  wind_speed_m_s: { field: 'wind_speed_m_s', ...range('wind_speed_m_s'), scale: 1 },
  relative_humidity_pct: { field: 'relative_humidity', min: 0, max: 100, unit: '%', scale: 0.01 },
  relative_humidity: { field: 'relative_humidity', ...range('relative_humidity'), scale: 1 },
  pressure_hPa: { field: 'pressure_hPa', ...range('surface_pressure_hPa'), scale: 1 },
};

function range(name: keyof typeof LIMITS): { min: number; max: number; unit: string } {
  const [min, max, unit] = LIMITS[name];
  return { min, max, unit };
}

/** Every column name the header may use. */
export const SERIES_COLUMN_NAMES = ['time', ...Object.keys(NUMERIC_COLUMNS)] as const;

/** The header of a series file with humidity in per cent (the form the demo uses). */
export const SERIES_HEADER = 'time,air_temperature_C,sea_temperature_C,wind_speed_m_s,relative_humidity_pct,pressure_hPa';

/** ISO 8601 date and time as accepted here: a date, "T" (or one space), hours and minutes, optional seconds and zone. */
const ISO_TIME = /^\d{4}-\d{2}-\d{2}[T ]\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})?$/;

/** Splits one CSV line; a field may be wrapped in double quotes ("" inside stands for one quote). */
export function splitCsvLine(line: string): string[] {
  const fields: string[] = [];
  let i = 0;
  for (;;) {
    let field = '';
    if (line[i] === '"') {
      i++;
      while (i < line.length) {
        if (line[i] === '"' && line[i + 1] === '"') (field += '"'), (i += 2);
        else if (line[i] === '"') break;
        else field += line[i++];
      }
      i++;
      while (i < line.length && line[i] !== ',') field += line[i++];
    } else {
      while (i < line.length && line[i] !== ',') field += line[i++];
    }
    fields.push(field.trim());
    if (i >= line.length) return fields;
    i++;
  }
}

/** Reads the header: the index of each column, with every problem named. */
function readHeader(fields: string[], line: number): { index: Map<string, number>; humidity: ParsedSeries['humidity_column'] } {
  const problems: string[] = [];
  const index = new Map<string, number>();
  fields.forEach((name, i) => {
    if (!(SERIES_COLUMN_NAMES as readonly string[]).includes(name)) {
      problems.push(`header (line ${line}): unknown column ${JSON.stringify(name)}; the columns are ${SERIES_COLUMN_NAMES.join(', ')} (units in the names)`);
    } else if (index.has(name)) {
      problems.push(`header (line ${line}): column ${JSON.stringify(name)} appears twice`);
    } else index.set(name, i);
  });
  const hasPct = index.has('relative_humidity_pct');
  const hasFraction = index.has('relative_humidity');
  if (hasPct && hasFraction) problems.push(`header (line ${line}): give relative humidity once, as relative_humidity_pct (0..100) or relative_humidity (0..1)`);
  for (const name of ['time', 'air_temperature_C', 'sea_temperature_C', 'wind_speed_m_s', 'pressure_hPa']) {
    if (!index.has(name)) problems.push(`header (line ${line}): missing column ${name}`);
  }
  if (!hasPct && !hasFraction) problems.push(`header (line ${line}): missing column relative_humidity_pct (or relative_humidity as a fraction)`);
  if (problems.length > 0) {
    const [field, ...rest] = problems[0].split(': ');
    throw new SeriesError(field, rest.join(': '), problems);
  }
  return { index, humidity: hasPct ? 'relative_humidity_pct' : 'relative_humidity' };
}

/** Reads one data row; pushes its problems to `bad` and returns null when it has any. */
function readRow(fields: string[], line: number, index: Map<string, number>, previous: SeriesRow | undefined, bad: BadRow[]): SeriesRow | null {
  if (fields.length !== index.size) {
    bad.push({ line, field: 'row', value: fields.join(','), message: `has ${fields.length} fields, the header has ${index.size}` });
    return null;
  }
  const before = bad.length;
  const time = fields[index.get('time')!];
  const time_ms = ISO_TIME.test(time) ? Date.parse(time.replace(' ', 'T')) : NaN;
  if (!Number.isFinite(time_ms)) {
    bad.push({ line, field: 'time', value: time, message: `${JSON.stringify(time)} is not an ISO 8601 date and time (e.g. 2031-06-14T13:00+01:00)` });
  } else if (previous && !(time_ms > previous.time_ms)) {
    bad.push({ line, field: 'time', value: time, message: `${time} is not later than the previous good row's ${previous.time} (line ${previous.line})` });
  }
  const row: SeriesRow = { line, time, time_ms, air_temperature_C: 0, sea_temperature_C: 0, wind_speed_m_s: 0, relative_humidity: 0, pressure_hPa: 0 };
  for (const [name, spec] of Object.entries(NUMERIC_COLUMNS)) {
    const at = index.get(name);
    if (at === undefined) continue;
    const text = fields[at];
    const value = text === '' ? NaN : Number(text);
    const allowed = `allowed ${spec.min}..${spec.max} ${spec.unit}`;
    if (text === '') bad.push({ line, field: name, value: text, message: `missing value (${allowed})` });
    else if (!Number.isFinite(value)) bad.push({ line, field: name, value: text, message: `${JSON.stringify(text)} is not a number (${allowed})` });
    else if (value < spec.min || value > spec.max) bad.push({ line, field: name, value: text, message: `${text} is out of range: ${allowed}` });
    else row[spec.field] = value * spec.scale;
  }
  return bad.length === before ? row : null;
}

/**
 * Parses the text of a series file.
 * @param text the whole file (UTF-8; a byte-order mark and CRLF line ends are accepted).
 * @returns good rows in file order and every bad row (each problem once, with line and field).
 * @throws SeriesError when the header is missing or wrong (unknown, repeated or missing columns).
 */
export function parseSeriesCsv(text: string): ParsedSeries {
  const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/);
  let header: ReturnType<typeof readHeader> | null = null;
  const rows: SeriesRow[] = [];
  const bad: BadRow[] = [];
  lines.forEach((raw, i) => {
    const trimmed = raw.trim();
    if (trimmed === '' || trimmed.startsWith('#')) return;
    const fields = splitCsvLine(trimmed);
    if (!header) {
      header = readHeader(fields, i + 1);
      return;
    }
    const row = readRow(fields, i + 1, header.index, rows[rows.length - 1], bad);
    if (row) rows.push(row);
  });
  if (!header) throw new SeriesError('header', `no header line; expected e.g. ${SERIES_HEADER}`);
  return { rows, bad, humidity_column: (header as ReturnType<typeof readHeader>).humidity };
}

/**
 * The rows to compute: all of them when none is bad; with bad rows, the good ones when
 * skipBadRows is set, else a SeriesError listing every bad row (never a silent skip).
 * @throws SeriesError when bad rows are not to be skipped, or when no good row is left.
 */
export function usableRows(parsed: ParsedSeries, skipBadRows: boolean): SeriesRow[] {
  if (parsed.bad.length > 0 && !skipBadRows) {
    const problems = parsed.bad.map(describeBadRow);
    const lines = [...new Set(parsed.bad.map((b) => b.line))];
    problems.unshift(`${lines.length} bad row${lines.length > 1 ? 's' : ''} (lines ${lines.join(', ')}); fix them or pass --skip-bad-rows to leave them out`);
    throw new SeriesError('series', problems[0], problems, parsed.bad);
  }
  if (parsed.rows.length === 0) {
    throw new SeriesError('series', parsed.bad.length > 0 ? 'every row is bad: nothing left to compute' : 'the file has a header but no rows');
  }
  return parsed.rows;
}
