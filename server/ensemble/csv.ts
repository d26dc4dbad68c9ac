/** The members of an ensemble as CSV (RFC 4180: comma separated, quoted where needed, CRLF line ends). */

/** A member row: named columns of numbers, strings or nulls (empty cells). */
export type CsvRow = Record<string, number | string | boolean | null>;

function cell(value: number | string | boolean | null): string {
  if (value === null) return '';
  const text = String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/**
 * Renders rows as CSV with the given columns in order.
 * @param columns header names (also the keys read from each row).
 * @param rows the rows; missing keys give empty cells.
 * @returns the CSV text, header first, ending with a line break.
 * Reference: RFC 4180 (2005), "Common Format and MIME Type for CSV Files", §2.
 */
export function toCsv(columns: readonly string[], rows: readonly CsvRow[]): string {
  const lines = [columns.map(cell).join(','), ...rows.map((row) => columns.map((c) => cell(row[c] ?? null)).join(','))];
  return lines.join('\r\n') + '\r\n';
}
