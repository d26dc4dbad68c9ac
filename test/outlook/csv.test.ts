import { describe, expect, it } from 'vitest';
import { parseSeriesCsv, SERIES_HEADER, splitCsvLine, usableRows } from '../../server/outlook/csv.js';
import { SeriesError } from '../../server/outlook/errors.js';

/** Parses text that must fail with a SeriesError, and returns it. */
function seriesErrorOf(run: () => unknown): SeriesError {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(SeriesError);
    return error as SeriesError;
  }
  throw new Error('expected a SeriesError');
}

const GOOD = [
  '# Invented rows for the tests',
  SERIES_HEADER,
  '2031-05-17T13:00+01:00,18.5,9.9,4.0,57,1016.7',
  '',
  '2031-05-17T14:00+01:00,19.3,9.9,4.3,54,1016.6',
].join('\n');

describe('reading a series file', () => {
  it('reads the rows in file units, humidity in per cent as a fraction, with their own line numbers', () => {
    const parsed = parseSeriesCsv(GOOD);
    expect(parsed.bad).toEqual([]);
    expect(parsed.humidity_column).toBe('relative_humidity_pct');
    expect(parsed.rows.map((r) => r.line)).toEqual([3, 5]);
    expect(parsed.rows[0]).toMatchObject({
      time: '2031-05-17T13:00+01:00',
      air_temperature_C: 18.5,
      sea_temperature_C: 9.9,
      wind_speed_m_s: 4,
      pressure_hPa: 1016.7,
    });
    // 57 % as a fraction; the product 57 × 0.01 is within one ulp of 0.57.
    expect(parsed.rows[0].relative_humidity).toBeCloseTo(0.57, 15);
    expect(parsed.rows[1].time_ms - parsed.rows[0].time_ms).toBe(3_600_000);
  });

  it('accepts columns in any order, humidity as a fraction, CRLF line ends and a byte-order mark', () => {
    const text = '\uFEFFpressure_hPa,time,relative_humidity,wind_speed_m_s,sea_temperature_C,air_temperature_C\r\n1013,2031-05-17T13:00Z,0.8,5,10,15\r\n';
    const parsed = parseSeriesCsv(text);
    expect(parsed.bad).toEqual([]);
    expect(parsed.humidity_column).toBe('relative_humidity');
    expect(parsed.rows[0]).toMatchObject({ line: 2, relative_humidity: 0.8, air_temperature_C: 15, sea_temperature_C: 10, pressure_hPa: 1013 });
  });

  it('splits quoted fields, with doubled quotes standing for one', () => {
    expect(splitCsvLine('"2031-05-17T13:00Z", 15 ,"a ""b"", c",')).toEqual(['2031-05-17T13:00Z', '15', 'a "b", c', '']);
  });

  it('names an unknown column (a unit missing from its name) and lists the columns it knows', () => {
    const error = seriesErrorOf(() => parseSeriesCsv('time,air_temperature,sea_temperature_C,wind_speed_m_s,relative_humidity_pct,pressure_hPa\n'));
    expect(error.message).toMatch(/line 1.*unknown column "air_temperature"/);
    expect(error.message).toContain('air_temperature_C');
    expect(error.problems.some((p) => p.includes('missing column air_temperature_C'))).toBe(true);
  });

  it('refuses humidity given twice and a file without a header', () => {
    expect(seriesErrorOf(() => parseSeriesCsv(`${SERIES_HEADER},relative_humidity\n`)).message).toMatch(/relative humidity once/);
    expect(seriesErrorOf(() => parseSeriesCsv('# only a comment\n\n')).message).toMatch(/no header/);
  });

  it('reports every bad value with its line, field and allowed range', () => {
    const text = [
      SERIES_HEADER,
      '2031-05-17T13:00+01:00,18.5,9.9,4.0,57,1016.7',
      '2031-05-17T14:00+01:00,19.3,9.9,-1,54,1016.6',
      '2031-05-17T15:00+01:00,abc,9.9,4.3,,1016.6',
      '2031-05-17T16:00+01:00,19.3,9.9,4.3,54',
      '17/05/2031 17:00,19.3,9.9,4.3,54,1016.6',
      '2031-05-17T12:00+01:00,19.3,9.9,4.3,140,1016.6',
    ].join('\n');
    const parsed = parseSeriesCsv(text);
    expect(parsed.rows.map((r) => r.line)).toEqual([2]);
    expect(parsed.bad.map((b) => [b.line, b.field])).toEqual([
      [3, 'wind_speed_m_s'],
      [4, 'air_temperature_C'],
      [4, 'relative_humidity_pct'],
      [5, 'row'],
      [6, 'time'],
      [7, 'time'],
      [7, 'relative_humidity_pct'],
    ]);
    expect(parsed.bad[0].message).toBe('-1 is out of range: allowed 0..40 m/s');
    expect(parsed.bad[1].message).toMatch(/"abc" is not a number \(allowed -40..45 °C\)/);
    expect(parsed.bad[2].message).toMatch(/missing value/);
    expect(parsed.bad[3].message).toBe('has 5 fields, the header has 6');
    expect(parsed.bad[5].message).toMatch(/not later than the previous good row's .* \(line 2\)/);
    expect(parsed.bad[6].message).toBe('140 is out of range: allowed 0..100 %');
  });

  it('fails on bad rows, listing their lines, unless told to skip them', () => {
    const text = [SERIES_HEADER, '2031-05-17T13:00Z,18.5,9.9,4.0,57,1016.7', '2031-05-17T14:00Z,19.3,99,4.3,54,1016.6', '2031-05-17T15:00Z,19.3,9.9,4.3,54,2000'].join('\n');
    const parsed = parseSeriesCsv(text);
    const error = seriesErrorOf(() => usableRows(parsed, false));
    expect(error.message).toMatch(/2 bad rows \(lines 3, 4\).*--skip-bad-rows/);
    expect(error.problems).toContain('line 3, sea_temperature_C: 99 is out of range: allowed -2.5..40 °C');
    expect(error.problems).toContain('line 4, pressure_hPa: 2000 is out of range: allowed 500..1100 hPa');
    expect(error.badRows).toHaveLength(2);
    expect(usableRows(parsed, true).map((r) => r.line)).toEqual([2]);
  });

  it('fails when no row is left, even when skipping', () => {
    const onlyBad = parseSeriesCsv(`${SERIES_HEADER}\n2031-05-17T13:00Z,18.5,9.9,4.0,57,x\n`);
    expect(seriesErrorOf(() => usableRows(onlyBad, true)).message).toMatch(/every row is bad/);
    expect(seriesErrorOf(() => usableRows(parseSeriesCsv(SERIES_HEADER), true)).message).toMatch(/no rows/);
  });
});
