/**
 * Loader for the published-table fixtures in test/data/ (STYLE.md §11).
 *
 * A fixture is a CSV file whose leading `#` lines form a header: the first must be `# source: …`
 * and one must be `# rows: N`. Then comes one line of column names and N rows of numbers. The
 * loader checks the source line, the column names, the declared row count and the row count the
 * caller expects, so an empty or truncated file fails instead of passing vacuously.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const DATA_DIR = fileURLToPath(new URL('../data/', import.meta.url));

/**
 * Reads test/data/<file> and returns its rows as objects keyed by column name.
 * @param file file name inside test/data/.
 * @param columns the column names the test relies on, in file order.
 * @param expectedRows how many data rows the source table has.
 */
export function loadFixture<C extends string>(file: string, columns: readonly C[], expectedRows: number): Record<C, number>[] {
  const lines = readFileSync(DATA_DIR + file, 'utf8').split('\n').map((line) => line.trim()).filter((line) => line !== '');
  const header = lines.filter((line) => line.startsWith('#'));
  const body = lines.filter((line) => !line.startsWith('#'));
  if (!header[0]?.startsWith('# source:')) throw new Error(`${file}: first line must be '# source: …'`);
  const declared = header.map((line) => /^# rows: (\d+)$/.exec(line)).find((match) => match !== null);
  if (!declared) throw new Error(`${file}: header lacks '# rows: N'`);
  if (Number(declared[1]) !== expectedRows) throw new Error(`${file}: header declares ${declared[1]} rows, test expects ${expectedRows}`);
  const names = (body[0] ?? '').split(',');
  if (names.join(',') !== columns.join(',')) throw new Error(`${file}: columns ${names.join(',')}, expected ${columns.join(',')}`);
  const rows = body.slice(1).map((line, index) => {
    const cells = line.split(',');
    if (cells.length !== columns.length) throw new Error(`${file}: row ${index + 1} has ${cells.length} cells, expected ${columns.length}`);
    const row = {} as Record<C, number>;
    columns.forEach((name, i) => {
      const value = Number(cells[i]);
      if (cells[i] === '' || !Number.isFinite(value)) throw new Error(`${file}: row ${index + 1} column ${name} is not a number: ${cells[i]}`);
      row[name] = value;
    });
    return row;
  });
  if (rows.length !== expectedRows) throw new Error(`${file}: ${rows.length} data rows, expected ${expectedRows}`);
  return rows;
}
