/**
 * The viewer's outlook panel in Chromium (test/browser/harness.ts): the demo outlook is computed by
 * the server and drawn as the chart of web/figures/outlook.ts.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openPage, screenshot, startViewer, type Viewer } from '../browser/harness.js';

let viewer: Viewer;

beforeAll(async () => {
  viewer = await startViewer();
});
afterAll(async () => {
  await viewer?.close();
});

describe('the outlook panel', () => {
  it('draws the demo outlook: one point per row of the two invented days, strengths within 0..1', async () => {
    const page = await openPage(viewer);
    await page.click('#outlook-demo');
    await page.waitForSelector('#panel-outlook[data-ready]', { timeout: 120_000 });
    expect(await page.getAttribute('#panel-outlook', 'data-ready')).toBe('1');
    expect(await page.textContent('#panel-outlook [role=status]')).toMatch(/^48 rows for Tarrowgale Head lookout \(invented\)/);
    const traces = await page.$eval('#plot-outlook', (div) => (div as unknown as { data: { name: string; y: (number | null)[] }[] }).data.map((t) => ({ name: t.name, y: t.y })));
    const strength = traces.find((t) => /^strength/.test(t.name))!;
    expect(strength.y).toHaveLength(48);
    for (const s of strength.y) {
      expect(s).toBeGreaterThanOrEqual(0);
      expect(s).toBeLessThanOrEqual(1);
    }
    expect(viewer.pageErrors).toEqual([]);
    await screenshot(page, 'outlook-panel');
    await page.close();
  });
});
