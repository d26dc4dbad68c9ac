/** The errors a bad outlook input gives: a series file or a site file, each naming what is wrong. */
import { InputError } from '../../sim/errors.js';

/** One bad row of a series: its line in the file (1-based, comments and header counted), the field and why. */
export interface BadRow {
  line: number;
  /** Column name, or "row" for a problem with the whole row (wrong number of fields). */
  field: string;
  /** The text found in the file (empty when the field is missing). */
  value: string;
  message: string;
}

/** Formats a bad row as "line 12, pressure_hPa: ...". */
export function describeBadRow(bad: BadRow): string {
  return `line ${bad.line}, ${bad.field}: ${bad.message}`;
}

/**
 * A series file that cannot be used: a header problem, no rows, or bad rows without
 * --skip-bad-rows. `problems` lists every one (the CLI prints each on its own line).
 */
export class SeriesError extends InputError {
  readonly problems: string[];
  /** The bad rows, when that is what is wrong (else empty). */
  readonly badRows: BadRow[];
  constructor(field: string, message: string, problems?: string[], badRows: BadRow[] = []) {
    super(field, message);
    this.name = 'SeriesError';
    this.problems = problems ?? [this.message];
    this.badRows = badRows;
  }
}

/** A site file that cannot be used; `problems` lists every "field: message". */
export class SiteError extends InputError {
  readonly problems: string[];
  constructor(field: string, message: string, problems?: string[]) {
    super(field, message);
    this.name = 'SiteError';
    this.problems = problems ?? [this.message];
  }
}
