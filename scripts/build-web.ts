/**
 * Builds the viewer bundle (web/ → dist/web/app.js) with esbuild. `npm start` does this by itself
 * when the bundle is missing or stale; this script forces a build.
 *
 *   node --import tsx scripts/build-web.ts [--no-minify]
 */
import { relative } from 'node:path';
import { REPO_ROOT, VIEWER_PATHS, buildViewerBundle } from '../server/http/bundle.js';

const minify = !process.argv.includes('--no-minify');
const { file, build_ms } = await buildViewerBundle(VIEWER_PATHS, minify);
process.stdout.write(`built ${relative(REPO_ROOT, file)} in ${build_ms.toFixed(0)} ms${minify ? '' : ' (not minified)'}\n`);
