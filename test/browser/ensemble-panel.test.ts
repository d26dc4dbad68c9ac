/**
 * The viewer's ensemble panel in Chromium: runs a small ensemble of the built-in incident profile,
 * shows the streamed progress finishing, the summary and the probability chart.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openPage, startViewer, type Viewer } from './harness.js';

let viewer: Viewer;

beforeAll(async () => {
  viewer = await startViewer();
});
afterAll(async () => {
  await viewer?.close();
});

describe('the ensemble panel', () => {
  it('runs an ensemble, fills the progress bar and draws the outcome probabilities', async () => {
    const page = await openPage(viewer, 'incident-corran-star');
    await page.fill('#ensemble-members', '6');
    await page.click('#ensemble-run');
    await page.waitForSelector('#panel-ensemble[data-ready]', { timeout: 60_000 });
    expect(await page.$eval('#ensemble-progress', (p) => (p as unknown as { value: number }).value)).toBe(1);
    expect(await page.textContent('#panel-ensemble [role=status]')).toMatch(/^6 runs/);
    expect(await page.$$eval('#ensemble-summary li', (items) => items.length)).toBeGreaterThan(1);
    const bars = await page.$eval('#plot-ensemble', (div) => (div as unknown as { data: { y?: number[] }[] }).data[0].y ?? []);
    // The three outcome probabilities in percent add up to 100.
    expect(bars.reduce((a, b) => a + b, 0)).toBeCloseTo(100, 9);
    // Chromium now and then reports the streamed /api/ensemble response as net::ERR_ABORTED at the
    // moment its last chunk arrives, although the page has read it to the end (the result above is
    // drawn from its last line); seen in about one run in four, also with res.end(lastLine). Any
    // other problem fails the test.
    const problems = viewer.pageErrors.filter((e) => !/^request failed: http:\/\/127\.0\.0\.1:\d+\/api\/ensemble$/.test(e));
    expect(problems, problems.join('\n')).toEqual([]);
    await page.close();
  });
});
