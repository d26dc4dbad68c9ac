/**
 * The viewer bundle: web/*.ts bundled by esbuild into dist/web/app.js (git-ignored). The start
 * script builds it when it is missing or older than any source under web/, so `npm start` works
 * from a clean clone; scripts/build-web.ts builds it on demand.
 */
import { mkdir, readdir, rename, stat, writeFile } from 'node:fs/promises';
import { basename, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The repository root (two levels above this file). */
export const REPO_ROOT = resolve(fileURLToPath(new URL('../..', import.meta.url)));

/** Where the viewer lives: its TypeScript sources, its static files and the built bundle. */
export const VIEWER_PATHS = Object.freeze({
  sourceDir: join(REPO_ROOT, 'web'),
  entry: join(REPO_ROOT, 'web', 'main.ts'),
  publicDir: join(REPO_ROOT, 'web', 'public'),
  bundleDir: join(REPO_ROOT, 'dist', 'web'),
  bundleFile: join(REPO_ROOT, 'dist', 'web', 'app.js'),
});

async function newestSource_ms(dir: string): Promise<number> {
  let newest = 0;
  for (const entry of await readdir(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) {
      if (entry.name !== 'public' && entry.name !== 'node_modules') newest = Math.max(newest, await newestSource_ms(path));
    } else if (entry.name.endsWith('.ts')) {
      newest = Math.max(newest, (await stat(path)).mtimeMs);
    }
  }
  return newest;
}

/** True when the bundle is missing or older than a source file under web/. */
export async function viewerBundleIsStale(paths = VIEWER_PATHS): Promise<boolean> {
  let built_ms: number;
  try {
    built_ms = (await stat(paths.bundleFile)).mtimeMs;
  } catch {
    return true;
  }
  return (await newestSource_ms(paths.sourceDir)) > built_ms;
}

/**
 * Bundles the viewer with esbuild (ES2020, one file with a source map). Plotly is not bundled: the
 * page loads it from /vendor/plotly.min.js (it sets window.Plotly).
 * @returns the bundle's path and the build time, ms.
 */
export async function buildViewerBundle(paths = VIEWER_PATHS, minify = true): Promise<{ file: string; build_ms: number }> {
  const started = performance.now();
  const esbuild = await import('esbuild');
  const result = await esbuild.build({
    entryPoints: [paths.entry],
    outfile: paths.bundleFile,
    bundle: true,
    format: 'iife',
    target: 'es2020',
    platform: 'browser',
    sourcemap: true,
    minify,
    logLevel: 'silent',
    tsconfig: join(paths.sourceDir, 'tsconfig.json'),
    write: false,
  });
  // Write each output beside its final name, then rename: a reader never sees half a bundle
  // (several test processes may build at once).
  await mkdir(paths.bundleDir, { recursive: true });
  for (const output of result.outputFiles) {
    const temporary = join(paths.bundleDir, `.${basename(output.path)}.${process.pid}.tmp`);
    await writeFile(temporary, output.contents);
    await rename(temporary, output.path);
  }
  return { file: paths.bundleFile, build_ms: performance.now() - started };
}

/** Builds the viewer bundle if it is missing or stale; returns whether it built. */
export async function ensureViewerBundle(paths = VIEWER_PATHS): Promise<boolean> {
  if (!(await viewerBundleIsStale(paths))) return false;
  await buildViewerBundle(paths);
  return true;
}
