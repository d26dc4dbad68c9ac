/**
 * The report in a real browser (Debian chromium through playwright-core): it works from a file
 * with no network, every figure is drawn (Plotly sets body[data-ready] to the figure count once
 * all are plotted), and the page logs no errors.
 */
import { readFile, rm } from 'node:fs/promises';
import { join } from 'node:path';
import { chromium, type Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { main } from '../../server/cli/main.js';
import { CHEAP_REPORT_ARGS, scenarioFolder } from './fixture.js';

const CHROMIUM_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-quic'];
const FIGURES = ['fig-air', 'fig-paths', 'fig-transfer', 'fig-view', 'fig-histograms', 'fig-sensitivity', 'fig-sighting'];

let dir = '';
let out = '';
let browser: Browser;

beforeAll(async () => {
  ({ dir } = await scenarioFolder());
  out = join(dir, 'browser-report.html');
  const quiet = vi.spyOn(process.stdout, 'write').mockImplementation(() => true);
  try {
    expect(await main(['report', join(dir, 'gull-narrows.json'), '--out', out, ...CHEAP_REPORT_ARGS])).toBe(0);
  } finally {
    quiet.mockRestore();
  }
  browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS });
});
afterAll(async () => {
  await browser?.close();
  await rm(dir, { recursive: true, force: true });
});

describe('report in chromium', () => {
  it('draws every figure offline without errors', async () => {
    const page = await browser.newPage({ viewport: { width: 1100, height: 900 } });
    const errors: string[] = [];
    const requests: string[] = [];
    page.on('console', (m) => m.type() === 'error' && errors.push(m.text()));
    page.on('pageerror', (e) => errors.push(String(e)));
    page.on('request', (r) => !r.url().startsWith('file:') && !r.url().startsWith('data:') && requests.push(r.url()));
    await page.goto(`file://${out}`);
    await page.waitForSelector('body[data-ready]', { timeout: 30_000 });
    expect(await page.getAttribute('body', 'data-ready')).toBe(String(FIGURES.length));
    for (const id of FIGURES) {
      // Plotly draws each trace as a g.trace (scatter, bar, histogram) or an image in the heatmap layer.
      const drawn = await page.$$eval(`#${id} .main-svg g.trace, #${id} .heatmaplayer image`, (nodes) => nodes.length);
      expect(drawn, `${id} has no drawn traces`).toBeGreaterThan(0);
    }
    const heatmap = await page.$$eval('#fig-view .heatmaplayer image', (nodes) => nodes.length);
    expect(heatmap).toBe(1);
    expect(errors).toEqual([]);
    expect(requests).toEqual([]);
    expect((await readFile(out, 'utf8')).length).toBeGreaterThan(3_000_000);
    await page.close();
  });
});
