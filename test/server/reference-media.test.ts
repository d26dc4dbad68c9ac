/**
 * server/service/reference-media.ts and its use by findings: the reference media are made once
 * per request, and a cache as the HTTP workers keep it changes no number of the findings.
 */
import { describe, expect, it } from 'vitest';
import { MediumCache } from '../../server/http/medium-cache.js';
import { scenarioFromJson } from '../../server/scenario/load.js';
import { findings } from '../../server/service/findings.js';
import { horizonFinding } from '../../server/service/horizon.js';
import { referenceMedia } from '../../server/service/reference-media.js';
import { sightCurves } from '../../server/service/sight.js';
import { buildMedium } from '../../sim/atmosphere/medium.js';
import { referenceScenario } from '../../sim/analysis/reference.js';

/** A 10 K surface inversion over 30 m (as in profiles/cold-channel-morning.json). */
const INVERSION = scenarioFromJson({
  name: 'inversion (test)',
  observer: { height_m: 6 },
  target: { range_m: 35_000, height_m: 40 },
  atmosphere: { profile: [{ height_m: 0, temperature_C: 2 }, { height_m: 30, temperature_C: 12 }] },
}).scenario;

describe('the reference media of a finding', () => {
  it('are straight lines up to the scenario’s own top, and the US 1976 medium that buildMedium makes of the reference scenario', () => {
    const medium = buildMedium(INVERSION);
    const refs = referenceMedia(INVERSION, medium);
    const geometry = buildMedium(referenceScenario(INVERSION, medium.column, 'geometry'));
    expect(refs.geometry.table).toEqual(geometry.table);
    expect(refs.standard!.table).toEqual(buildMedium(referenceScenario(INVERSION, medium.column, 'standard')).table);
    expect(refs.standardWarning).toBeNull();
  });

  it('give the same findings whether built in the request or taken from a cache, and the cache keeps the US 1976 medium', () => {
    const medium = buildMedium(INVERSION);
    const media = new MediumCache();
    const built = findings(INVERSION, { medium });
    const first = findings(INVERSION, { medium, media });
    const again = findings({ ...INVERSION, observer: { height_m: 7 } }, { medium, media });
    expect(first).toEqual(built);
    expect(media.misses).toBe(1);
    expect(media.hits).toBe(1);
    expect(again.horizon.standard).not.toEqual(first.horizon.standard);
  });

  it('are shared by the sight curves and the horizon as if each had made its own', () => {
    const medium = buildMedium(INVERSION);
    const refs = referenceMedia(INVERSION, medium);
    const shared = sightCurves(INVERSION, { medium, referenceMedia: refs });
    const own = sightCurves(INVERSION, { medium });
    expect(shared.standard).toEqual(own.standard);
    expect(shared.geometry).toEqual(own.geometry);
    expect(horizonFinding(INVERSION, { medium, referenceMedia: refs })).toEqual(horizonFinding(INVERSION, { medium }));
  });

  it('turn a US 1976 medium that cannot be built (a RangeError) into a warning, and throw any other error', () => {
    const medium = buildMedium(INVERSION);
    const refusing = { get: () => { throw new RangeError('surface air outside the model (test)'); } };
    const refs = referenceMedia(INVERSION, medium, refusing);
    expect(refs.standard).toBeNull();
    expect(refs.standardWarning).toBe('no US 1976 reference for this surface air: surface air outside the model (test)');
    const found = findings(INVERSION, { medium, media: refusing });
    expect(found.warnings).toContain(refs.standardWarning);
    expect(found.horizon.standard).toBeNull();
    expect(found.transfer.looming.standard).toBeNull();
    expect(found.visibility.compared.standard).toBeNull();
    const broken = { get: () => { throw new TypeError('a bug (test)'); } };
    expect(() => referenceMedia(INVERSION, medium, broken)).toThrow(TypeError);
  });
});
