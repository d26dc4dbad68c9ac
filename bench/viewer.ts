/**
 * Viewer benchmark: time from a committed edit (a field's change event) to the redrawn plots, for
 * the viewer's 501-ray fan, in Debian Chromium. Measured inside the page, from dispatching the
 * event to body[data-ready] changing (all requests answered and every plot drawn). Goal: median
 * ≤ 200 ms (issue 4). Typing waits EDIT_DEBOUNCE_MS before this starts; that wait is not counted.
 *
 *   node --import tsx bench/viewer.ts
 */
import { availableParallelism, loadavg } from 'node:os';
import type { Page } from 'playwright-core';
import { openPage, startViewer } from '../test/browser/harness.js';
import { DEFAULT_VIEWER_RAYS, EDIT_DEBOUNCE_MS } from '../web/session.js';

/** Edits timed per kind (after WARMUP untimed ones). */
const EDITS = 15;
const WARMUP = 3;
/** Goal of issue 4, ms. */
const GOAL_MS = 200;

interface Timing {
  total_ms: number;
  server_ms: number;
  draw_ms: number;
}

/** Sets a field's text and dispatches change in the page; resolves with the time until the redraw. */
async function timedEdit(page: Page, selector: string, value: string): Promise<Timing> {
  return page.evaluate(
    ([sel, val]) =>
      new Promise<Timing>((resolve) => {
        const doc = (globalThis as unknown as { document: any }).document;
        const body = doc.body;
        const before = body.dataset.ready;
        const input = doc.querySelector(sel);
        const observer = new (globalThis as any).MutationObserver(() => {
          if (body.dataset.ready !== before) {
            observer.disconnect();
            resolve({ total_ms: performance.now() - started, server_ms: Number(body.dataset.serverMs), draw_ms: Number(body.dataset.drawMs) });
          }
        });
        observer.observe(body, { attributes: true, attributeFilter: ['data-ready'] });
        input.value = val;
        const started = performance.now();
        input.dispatchEvent(new (globalThis as any).Event('change', { bubbles: true }));
      }),
    [selector, value] as const,
  );
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : 0.5 * (s[s.length / 2 - 1] + s[s.length / 2]);
};
const quantile = (xs: number[], q: number) => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor(q * xs.length))];

async function series(page: Page, selector: string, values: (i: number) => string): Promise<Timing[]> {
  const out: Timing[] = [];
  for (let i = 0; i < WARMUP + EDITS; i++) {
    const t = await timedEdit(page, selector, values(i));
    if (i >= WARMUP) out.push(t);
  }
  return out;
}

function describe(label: string, timings: Timing[]): string {
  const total = timings.map((t) => t.total_ms);
  const m = median(total);
  return (
    `viewer: ${label}: edit→redraw median ${m.toFixed(0)} ms, p90 ${quantile(total, 0.9).toFixed(0)} ms ` +
    `(server ${median(timings.map((t) => t.server_ms)).toFixed(0)} ms, drawing ${median(timings.map((t) => t.draw_ms)).toFixed(0)} ms; ${EDITS} edits) — goal ≤ ${GOAL_MS} ms: ${m <= GOAL_MS ? 'met' : 'NOT met'}`
  );
}

export async function benchViewer(): Promise<string[]> {
  const startLoad = loadavg()[0];
  const viewer = await startViewer();
  try {
    const page = await openPage(viewer);
    const rays = await page.$eval('#plot-paths', (div) => ((div as any).data as { name?: string }[]).reduce((n, t) => n + Number(/\((\d+)\)/.exec(t.name ?? '')?.[1] ?? 0), 0));
    // Eye height: the medium is unchanged (cached on the server); the fan and findings are redone.
    const eye = await series(page, '[data-path="observer.height_m"]', (i) => (6 + 0.25 * ((i % 8) + 1)).toFixed(2));
    // A node's temperature: the air changes, so the server also rebuilds the medium.
    const node = await series(page, '[data-path="atmosphere.profile.1.temperature_C"]', (i) => (12 + 0.1 * ((i % 8) + 1)).toFixed(1));
    await page.close();
    return [
      `viewer: ${rays} rays drawn (viewer default ${DEFAULT_VIEWER_RAYS}), built-in scenario, Chromium headless, server in the same machine (${availableParallelism()} cores, load average ${startLoad.toFixed(1)} at the start)`,
      describe('eye-height edit', eye),
      describe('temperature-node edit', node),
      `viewer: typing waits ${EDIT_DEBOUNCE_MS} ms of quiet before the same work starts (Enter or leaving the field starts it at once)`,
    ];
  } finally {
    await viewer.close();
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  for (const line of await benchViewer()) console.log(line);
}
