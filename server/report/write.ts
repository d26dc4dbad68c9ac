/**
 * Writing output files atomically: the content goes to a temporary file in the same folder, which
 * then takes the final name in one step. Without `force` an existing file is never replaced (the
 * temporary file is hard-linked to the final name, which fails if that name exists), so a reader
 * sees either the old file or the whole new one, never a part.
 */
import { randomBytes } from 'node:crypto';
import { link, rename, unlink, writeFile } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import { InputError } from '../../sim/errors.js';

/** The output file exists and --force was not given. */
export class OutputExistsError extends InputError {
  readonly path: string;
  constructor(option: string, path: string) {
    super(option, `${path} already exists: pass --force to overwrite it`);
    this.name = 'OutputExistsError';
    this.path = path;
  }
}

/**
 * Writes a file atomically.
 * @param path the final file name.
 * @param content text (UTF-8) or bytes.
 * @param options force: replace an existing file (default false); option: the CLI option named in errors (default "--out").
 * @throws OutputExistsError when the file exists and force is false (the file is left untouched);
 *   InputError naming the option when the folder cannot be written.
 */
export async function writeFileAtomic(path: string, content: string | Uint8Array, options: { force?: boolean; option?: string } = {}): Promise<void> {
  const option = options.option ?? '--out';
  const temp = join(dirname(path), `.${basename(path)}.${process.pid}.${randomBytes(6).toString('hex')}.tmp`);
  try {
    await writeFile(temp, content, { flag: 'wx' });
  } catch (error) {
    throw new InputError(option, `cannot write in ${dirname(path)} (${(error as NodeJS.ErrnoException).code ?? (error as Error).message})`);
  }
  try {
    if (options.force) {
      await rename(temp, path);
      return;
    }
    await link(temp, path);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'EEXIST') throw new OutputExistsError(option, path);
    throw new InputError(option, `cannot write ${path} (${(error as NodeJS.ErrnoException).code ?? (error as Error).message})`);
  } finally {
    await unlink(temp).catch(() => undefined);
  }
}
