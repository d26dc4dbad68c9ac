import { describe, expect, it } from 'vitest';
import { outlookHtml } from '../../server/outlook/html.js';
import type { OutlookResult } from '../../server/service/outlook.js';
import { outlookFigure, wallClock } from '../../web/figures/outlook.js';

/** Two invented rows, the second with text that must not break out of the page's script. */
const RESULT = {
  site: { name: 'Test pier <invented>', observer_height_m: 5, air_temperature_height_m: 10, wind_height_m: 10, landmark: { name: 'Beacon', range_m: 20000, height_m: 30 }, earth_radius_m: 6371000 },
  reference: 'US Standard Atmosphere 1976',
  rows: [
    { line: 2, time: '2031-07-02T15:00+01:00', stability: 'stable', obukhov_length_m: 6.4, air_sea_difference_K: 5, horizon_shift_arcmin: 7.8, horizon_elevation_arcmin: 3, false_horizon: true, landmark_shift_arcmin: 5.7, landmark_elevation_arcmin: 1, landmark_magnification: 0.7, image_count: 1, resolvable_image_count: 1, lowest_visible_height_m: 0, reference_lowest_visible_height_m: 10, hidden_bands: [], label: 'lifted', strength: 0.95, warnings: [] },
    { line: 3, time: '2031-07-02T16:00+01:00', stability: 'near neutral', obukhov_length_m: null, air_sea_difference_K: 0, horizon_shift_arcmin: -0.1, horizon_elevation_arcmin: -4, false_horizon: false, landmark_shift_arcmin: null, landmark_elevation_arcmin: null, landmark_magnification: null, image_count: 0, resolvable_image_count: 0, lowest_visible_height_m: 30, reference_lowest_visible_height_m: 10, hidden_bands: [], label: '</script><b>', strength: 0, warnings: [] },
  ],
  skipped_rows: [],
  warnings: [],
} as unknown as OutlookResult;

describe('the outlook chart', () => {
  it('drops the zone from times for Plotly’s date axis and names the zone in the axis title', () => {
    expect(wallClock('2031-07-02T15:00+01:00')).toBe('2031-07-02 15:00');
    expect(wallClock('2031-07-02T15:00:30Z')).toBe('2031-07-02 15:00:30');
    const figure = outlookFigure(RESULT);
    expect((figure.layout.xaxis as { title: { text: string } }).title.text).toBe('time (UTC+01:00)');
  });

  it('draws each row’s numbers as given, gaps where the landmark is not seen', () => {
    const figure = outlookFigure(RESULT);
    const traces = figure.data as unknown as { name: string; y: unknown[]; customdata?: unknown[] }[];
    const trace = (name: RegExp) => traces.find((t) => name.test(t.name))!;
    expect(trace(/top seen higher/).y).toEqual([5.7, null]);
    expect(trace(/^horizon/).y).toEqual([7.8, -0.1]);
    expect(trace(/^vertical magnification/).y).toEqual([0.7, null]);
    expect(trace(/^strength/).y).toEqual([0.95, 0]);
    expect(trace(/^strength/).customdata).toEqual(['lifted', '</script><b>']);
    expect(trace(/told apart/).y).toEqual([1, 0]);
  });

  it('makes a page that draws from inlined script only, with the rows’ text kept out of the markup', async () => {
    const page = await outlookHtml(RESULT, 'Caution & care', 'window.Plotly = { newPlot: () => Promise.resolve() };');
    expect(page).toContain('<title>Mirage outlook — Test pier &lt;invented&gt;</title>');
    expect(page).toContain('Caution &amp; care');
    expect(page).not.toContain('</script><b>');
    expect(page).toContain('\\u003c/script>\\u003cb>');
    expect(page).not.toMatch(/<script[^>]+src=|https?:\/\//);
    expect(page).toContain("document.body.dataset.ready = '1'");
  });
});
