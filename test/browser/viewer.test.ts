/**
 * The viewer in Debian Chromium: it loads with every plot drawn, edits re-trace, bad input is
 * shown beside its field without breaking the page. Screenshots go to test-artifacts/.
 */
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { VIEW_CLASSES } from '../../sim/analysis/view.js';
import { COLOURS } from '../../web/figures/theme.js';
import { openPage, readyGeneration, screenshot, startViewer, waitForRedraw, type Viewer } from './harness.js';

let viewer: Viewer;

beforeAll(async () => {
  viewer = await startViewer();
});

afterAll(async () => {
  await viewer?.close();
});

/** The plots of the scenario panels (other panels, such as the outlook, draw on request). */
const SCENARIO_PLOTS = ['plot-air', 'plot-heights', 'plot-paths', 'plot-view'];
const SCENARIO_PLOTS_SELECTOR = SCENARIO_PLOTS.map((id) => `#${id}`).join(', ');

/** Number of plotted points per plot div (Plotly keeps the data on the div). */
async function plottedPoints(page: Page): Promise<Record<string, number>> {
  return page.$$eval(SCENARIO_PLOTS_SELECTOR, (divs) =>
    Object.fromEntries(
      divs.map((div) => {
        const data = (div as unknown as { data?: { x?: unknown[]; z?: unknown[] }[] }).data ?? [];
        const points = data.reduce((n, trace) => n + (trace.x ?? trace.z ?? []).filter((v) => v !== null).length, 0);
        return [div.id, points];
      }),
    ),
  );
}

/** The x values of the heights-at-the-target curve. */
async function heightsCurve(page: Page): Promise<(number | null)[]> {
  return page.$eval('#plot-heights', (div) => ((div as unknown as { data: { x: (number | null)[] }[] }).data[0].x));
}

async function setField(page: Page, selector: string, value: string): Promise<void> {
  const before = await readyGeneration(page);
  await page.fill(selector, value);
  await page.dispatchEvent(selector, 'change');
  await waitForRedraw(page, before);
}

describe('the viewer', () => {
  it('opens on the built-in scenario with data in every plot and no page errors', async () => {
    const page = await openPage(viewer);
    expect(await page.inputValue('#scenario-picker')).toBe('cold-channel-morning');
    const points = await plottedPoints(page);
    expect(Object.keys(points).sort()).toEqual(SCENARIO_PLOTS);
    for (const [id, n] of Object.entries(points)) expect(n, id).toBeGreaterThan(10);
    expect(await page.textContent('#findings')).not.toBe('');
    expect(viewer.pageErrors).toEqual([]);
    await screenshot(page, 'viewer-default');
    await page.close();
  });

  it('offers a PNG download on every plot, and no button that sends anything away', async () => {
    const page = await openPage(viewer);
    const titles = await page.$$eval(SCENARIO_PLOTS_SELECTOR, (divs) => divs.map((d) => [...d.querySelectorAll('.modebar-btn')].map((b) => b.getAttribute('data-title'))));
    expect(titles).toHaveLength(4);
    for (const list of titles) {
      expect(list).toContain('Download plot as a PNG');
      expect(list.join(' ')).not.toMatch(/share|cloud|edit in/i);
    }
    await page.close();
  });

  it('re-traces when the eye height changes: the heights at the target and the findings change', async () => {
    const page = await openPage(viewer);
    const curveBefore = await heightsCurve(page);
    const findingsBefore = await page.textContent('#findings');
    await setField(page, '[data-path="observer.height_m"]', '25');
    const curveAfter = await heightsCurve(page);
    expect(curveAfter).not.toEqual(curveBefore);
    expect(await page.textContent('#findings')).not.toBe(findingsBefore);
    expect(await page.textContent('#findings')).toContain('eye 25 m up');
    await screenshot(page, 'viewer-eye-25m');
    await page.close();
  });

  it('shows a bad node beside its field and keeps the page working', async () => {
    const page = await openPage(viewer);
    const selector = '[data-path="atmosphere.profile.1.height_m"]';
    await setField(page, selector, '0');
    const slot = page.locator('[data-error-for="atmosphere.profile.1.height_m"]');
    expect(await slot.textContent()).toMatch(/greater than the previous node/);
    expect(await page.getAttribute(selector, 'aria-invalid')).toBe('true');
    const points = await plottedPoints(page);
    for (const [id, n] of Object.entries(points)) expect(n, id).toBeGreaterThan(10);
    await screenshot(page, 'viewer-bad-node');
    // Text that is not a number is caught in the page, beside the field, and nothing is sent.
    await page.fill(selector, '12 m');
    expect(await slot.textContent()).toMatch(/not a number/);
    // Fixing the node clears the message and traces again.
    await setField(page, selector, '30');
    expect(await slot.textContent()).toBe('');
    expect(await page.getAttribute(selector, 'aria-invalid')).toBeNull();
    expect(viewer.pageErrors).toEqual([]);
    await page.close();
  });

  it('shows an inverted image of the hut in the simulated view when switched to the inferior mirage', async () => {
    const page = await openPage(viewer);
    const before = await readyGeneration(page);
    await page.selectOption('#scenario-picker', 'inferior-mirage-hot-flats');
    await waitForRedraw(page, before);
    expect(await page.inputValue('[data-path="observer.height_m"]')).toBe('1.6');
    const view = await page.$eval('#plot-view', (div) => {
      const d = div as unknown as { data: { y: number[]; z: number[][] }[]; layout: { shapes: { xref: string; x0: number; y0: number; y1: number; fillcolor?: string }[] } };
      const bars = d.layout.shapes.filter((s) => s.xref === 'paper' && s.x0 > 1).map((s) => ({ y0: s.y0, y1: s.y1, fill: s.fillcolor }));
      return { y: d.data[0].y, z: d.data[0].z, bars };
    });
    const target = VIEW_CLASSES.indexOf('target');
    const inverted = view.bars.filter((b) => b.fill === COLOURS.imageInverted);
    expect(inverted.length).toBeGreaterThan(0);
    // The rows of the inverted image show the target (the hut's image, upside down below the erect one).
    const rowsWithTarget = view.y.filter((y, i) => inverted.some((b) => y >= b.y0 && y <= b.y1) && view.z[i].includes(target));
    expect(rowsWithTarget.length).toBeGreaterThan(0);
    const erect = view.bars.filter((b) => b.fill === COLOURS.imageErect);
    expect(Math.max(...inverted.map((b) => b.y1))).toBeLessThanOrEqual(Math.min(...erect.map((b) => b.y0)) + 1e-9);
    expect(await page.textContent('#findings')).toMatch(/inverted/);
    await screenshot(page, 'viewer-inferior-mirage');
    await page.close();
  });
});
