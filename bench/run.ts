/**
 * `npm run bench`: every benchmark in one run, printing figures and ratios (never part of the tests).
 * Run one section with `npm run bench -- trace` (sections: trace, findings, outlook, ensemble, server, viewer).
 */
import { cpus } from 'node:os';
import { benchTrace } from './trace.js';
import { benchFindings } from './findings.js';
import { benchOutlook } from './outlook.js';
import { benchEnsemble } from './ensemble.js';
import { benchServer } from './server.js';
import { benchViewer } from './viewer.js';

const SECTIONS: Record<string, () => Promise<string[]>> = {
  trace: benchTrace,
  findings: () => benchFindings(),
  outlook: benchOutlook,
  ensemble: benchEnsemble,
  server: benchServer,
  viewer: benchViewer,
};

async function main(): Promise<void> {
  const wanted = process.argv.slice(2).filter((a) => !a.startsWith('-'));
  const unknown = wanted.filter((w) => !(w in SECTIONS));
  if (unknown.length > 0) {
    process.stderr.write(`bench: unknown section(s) ${unknown.join(', ')}; choose from ${Object.keys(SECTIONS).join(', ')}\n`);
    process.exitCode = 2;
    return;
  }
  const names = wanted.length > 0 ? wanted : Object.keys(SECTIONS);
  console.log(`Loomline benchmarks — node ${process.version}, ${cpus().length} cores (${cpus()[0]?.model ?? 'unknown CPU'}), ${new Date().toISOString()}`);
  for (const name of names) {
    console.log(`\n## ${name}`);
    const started = Date.now();
    try {
      for (const line of await SECTIONS[name]()) console.log(line);
    } catch (error) {
      console.log(`failed: ${(error as Error).message}`);
      process.exitCode = 1;
    }
    console.log(`(${name}: ${((Date.now() - started) / 1000).toFixed(1)} s)`);
  }
}

await main();
