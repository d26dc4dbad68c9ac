/** Plain-text tables for the command line: right-aligned numbers, a rule under the header. */

export interface Column<Row> {
  header: string;
  value: (row: Row) => string | number | null | undefined;
  /** Significant digits for numbers (default: shown as given). */
  digits?: number;
  /** Fixed decimals for numbers (overrides digits). */
  decimals?: number;
}

function formatCell(value: string | number | null | undefined, column: Column<never>): string {
  if (value === null || value === undefined) return '—';
  if (typeof value === 'string') return value;
  if (!Number.isFinite(value)) return String(value);
  if (column.decimals !== undefined) return value.toFixed(column.decimals);
  if (column.digits !== undefined) return Number(value.toPrecision(column.digits)).toString();
  return String(value);
}

/** Renders rows as an aligned text table. */
export function renderTable<Row>(rows: readonly Row[], columns: readonly Column<Row>[]): string {
  const cells = rows.map((row) => columns.map((c) => formatCell(c.value(row), c as Column<never>)));
  const widths = columns.map((c, i) => Math.max(c.header.length, ...cells.map((r) => r[i].length)));
  const line = (parts: string[]) => parts.map((p, i) => p.padStart(widths[i])).join('  ');
  return [line(columns.map((c) => c.header)), widths.map((w) => '─'.repeat(w)).join('  '), ...cells.map(line)].join('\n');
}

/** Renders "key: value" lines with aligned values. */
export function renderPairs(pairs: readonly [string, string | number | boolean | null][]): string {
  const width = Math.max(...pairs.map(([k]) => k.length));
  return pairs.map(([k, v]) => `${k.padEnd(width)}  ${v === null ? '—' : String(v)}`).join('\n');
}
