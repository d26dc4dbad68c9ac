import { mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { OutputExistsError, writeFileAtomic } from '../../server/report/write.js';

let dir = '';
beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'loomline-write-'));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('writeFileAtomic', () => {
  it('writes a new file and leaves no temporary file behind', async () => {
    const path = join(dir, 'a.html');
    await writeFileAtomic(path, 'first');
    expect(await readFile(path, 'utf8')).toBe('first');
    expect(await readdir(dir)).toEqual(['a.html']);
  });

  it('refuses to replace an existing file without force and leaves it untouched', async () => {
    const path = join(dir, 'b.html');
    await writeFile(path, 'original');
    await expect(writeFileAtomic(path, 'second')).rejects.toThrow(OutputExistsError);
    await expect(writeFileAtomic(path, 'second', { option: '--csv' })).rejects.toThrow(/--csv: .*b\.html already exists: pass --force/);
    expect(await readFile(path, 'utf8')).toBe('original');
    expect((await readdir(dir)).filter((f) => f.endsWith('.tmp'))).toEqual([]);
  });

  it('replaces an existing file with force', async () => {
    const path = join(dir, 'c.html');
    await writeFile(path, 'original');
    await writeFileAtomic(path, 'replacement', { force: true });
    expect(await readFile(path, 'utf8')).toBe('replacement');
  });

  it('names the option when the folder does not exist', async () => {
    await expect(writeFileAtomic(join(dir, 'missing', 'd.html'), 'x')).rejects.toThrow(/--out: cannot write in .*missing \(ENOENT\)/);
  });
});
