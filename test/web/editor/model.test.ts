/** web/editor/model.ts, air.ts and issues.ts: the editor without a page. */
import { describe, expect, it } from 'vitest';
import { addNode, airSampleHeights, editNode, removeNode, switchAir } from '../../../web/editor/air.js';
import { placeIssues } from '../../../web/editor/issues.js';
import { applyField, fieldSections, getPath, parseNumberText, setPath } from '../../../web/editor/model.js';

const SCENARIO = {
  name: 'Editor test (invented)',
  observer: { height_m: 6 },
  target: { range_m: 35000, height_m: 40, shape: 'tower' },
  atmosphere: { surface_pressure_hPa: 1013.25, relative_humidity: 0.7, profile: [{ height_m: 0, temperature_C: 2 }, { height_m: 30, temperature_C: 12 }], above: 'us1976' },
  optics: { wavelength_nm: 550, index_model: 'ciddor' },
  extra_section_kept: { a: 1 },
};

describe('paths', () => {
  it('reads and writes dotted paths without touching the original', () => {
    const next = setPath(SCENARIO, 'atmosphere.profile.1.temperature_C', 14);
    expect(getPath(next, 'atmosphere.profile.1.temperature_C')).toBe(14);
    expect(getPath(SCENARIO, 'atmosphere.profile.1.temperature_C')).toBe(12);
    expect(getPath(next, 'extra_section_kept.a')).toBe(1);
    expect(getPath(setPath(SCENARIO, 'target.shape', undefined), 'target')).toEqual({ range_m: 35000, height_m: 40 });
  });
});

describe('reading fields', () => {
  it('reads numbers, a minus sign, and distributions as JSON; names what it cannot read', () => {
    expect(parseNumberText(' 12.5 ', false)).toEqual({ ok: true, value: 12.5 });
    expect(parseNumberText('\u22123', false)).toEqual({ ok: true, value: -3 });
    expect(parseNumberText('{"normal":{"mean":1,"sd":0.5}}', false)).toEqual({ ok: true, value: { normal: { mean: 1, sd: 0.5 } } });
    expect(parseNumberText('abc', false)).toEqual({ ok: false, message: '"abc" is not a number' });
    expect(parseNumberText('', false)).toEqual({ ok: false, message: 'required' });
    expect(parseNumberText('', true)).toEqual({ ok: true, value: undefined });
  });

  it('applies a field and refuses text that is not a number', () => {
    const spec = fieldSections(SCENARIO).flatMap((s) => s.fields).find((f) => f.path === 'observer.height_m')!;
    expect(applyField(SCENARIO, spec, '9')).toEqual({ scenario: setPath(SCENARIO, 'observer.height_m', 9) });
    expect(applyField(SCENARIO, spec, '9 m')).toEqual({ error: '"9 m" is not a number' });
  });

  it('starts a custom shape from a block as tall as the target when no outline is given', () => {
    const spec = fieldSections(SCENARIO).flatMap((s) => s.fields).find((f) => f.path === 'target.shape')!;
    const result = applyField(SCENARIO, spec, 'custom') as { scenario: Record<string, unknown> };
    expect(getPath(result.scenario, 'target.outline')).toEqual([[0, 0], [0, 40], [20, 40], [20, 0]]);
  });

  it('shows the wavelength only for optical index models and the outline only for a custom shape', () => {
    const paths = (s: object) => fieldSections(s as Record<string, unknown>).flatMap((x) => x.fields).map((f) => f.path);
    expect(paths(SCENARIO)).toContain('optics.wavelength_nm');
    expect(paths(setPath(SCENARIO, 'optics.index_model', 'radio'))).not.toContain('optics.wavelength_nm');
    expect(paths(SCENARIO)).not.toContain('target.outline');
    expect(paths(setPath(SCENARIO, 'target.shape', 'custom'))).toContain('target.outline');
  });
});

describe('the node table', () => {
  it('adds a node 10 m above the last at its temperature, and removes by index', () => {
    const added = addNode(SCENARIO);
    expect(getPath(added, 'atmosphere.profile.2')).toEqual({ height_m: 40, temperature_C: 12 });
    expect(getPath(removeNode(added, 0), 'atmosphere.profile')).toEqual([{ height_m: 30, temperature_C: 12 }, { height_m: 40, temperature_C: 12 }]);
  });

  it('keeps the last node of a profile', () => {
    const one = removeNode(SCENARIO, 1);
    expect(removeNode(one, 0)).toBe(one);
  });

  it('edits a cell or names why it cannot', () => {
    expect('scenario' in editNode(SCENARIO, 1, 'height_m', '25')).toBe(true);
    expect(editNode(SCENARIO, 1, 'height_m', 'x')).toEqual({ error: '"x" is not a number' });
  });
});

describe('switching the air', () => {
  it('keeps pressure and humidity and starts from the surface temperature', () => {
    const standard = switchAir(SCENARIO, 'standard');
    expect(standard.atmosphere).toEqual({ standard: 'us1976', surface_temperature_C: 2, surface_pressure_hPa: 1013.25, relative_humidity: 0.7 });
    const back = switchAir(standard, 'profile');
    expect(getPath(back, 'atmosphere.profile')).toEqual([{ height_m: 0, temperature_C: 2 }]);
  });
});

describe('airSampleHeights', () => {
  it('spans 0 to 1.6 × the highest height of interest, increasing, with the nodes and the eye included', () => {
    const heights = airSampleHeights(SCENARIO);
    expect(heights[0]).toBe(0);
    expect(heights[heights.length - 1]).toBeCloseTo(1.6 * 40, 9);
    for (let i = 1; i < heights.length; i++) expect(heights[i]).toBeGreaterThan(heights[i - 1]);
    for (const h of [6, 30]) expect(heights).toContain(h);
  });
});

describe('placeIssues', () => {
  it('puts each issue beside its field, or the nearest enclosing one, and keeps the rest general', () => {
    const placed = placeIssues(
      [
        { field: 'scenario.observer.height_m', message: '-6 is out of range' },
        { field: 'scenario.atmosphere.profile', message: 'too many nodes' },
        { field: 'scenario.atmosphere.profile.7.height_m', message: 'not increasing' },
        { field: 'scenario.colour', message: 'unknown key' },
        { field: 'body', message: 'not JSON' },
      ],
      ['observer.height_m', 'atmosphere.profile'],
    );
    expect(placed.byField.get('observer.height_m')).toEqual(['-6 is out of range']);
    expect(placed.byField.get('atmosphere.profile')).toEqual(['too many nodes', '7.height_m: not increasing']);
    expect(placed.general).toEqual(['scenario.colour: unknown key', 'body: not JSON']);
  });
});
