import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { RAD_PER_DEG } from '../../sim/constants.js';
import { radiusOfCurvature_m } from '../../sim/earth.js';
import { SiteError } from '../../server/outlook/errors.js';
import { loadSiteFile, siteFromText, SITE_DEFAULTS } from '../../server/outlook/site.js';

const DEMO_SITE = join(import.meta.dirname, '..', '..', 'profiles', 'outlook', 'site-tarrowgale-head.json');

const MINIMAL = {
  name: 'Test pier (invented)',
  observer: { height_m: 6 },
  measurements: { air_temperature_height_m: 5, wind_height_m: 10 },
  landmark: { range_m: 15000, height_m: 20 },
};

function siteErrorOf(value: unknown): SiteError {
  try {
    siteFromText(JSON.stringify(value));
  } catch (error) {
    expect(error).toBeInstanceOf(SiteError);
    return error as SiteError;
  }
  throw new Error('expected a SiteError');
}

describe('the outlook site file', () => {
  it('loads the demo site, says it is invented, and takes the Earth radius along the landmark azimuth', async () => {
    const { file, site } = await loadSiteFile(DEMO_SITE);
    expect(file.name).toMatch(/invented/i);
    expect(file.landmark.name).toMatch(/invented/i);
    expect(site.observer_height_m).toBe(14);
    expect(site.landmark_range_m).toBe(29000);
    // The same WGS 84 formula as scenario files use (sim/earth.ts): this checks the wiring, not the geodesy.
    expect(site.earth_radius_m).toBe(radiusOfCurvature_m(56.8 * RAD_PER_DEG, 250 * RAD_PER_DEG));
    expect(site.latitude_rad).toBe(56.8 * RAD_PER_DEG);
    expect(site.optics).toEqual({ wavelength_um: 0.55, index_model: 'ciddor', co2_ppm: 450 });
  });

  it('fills the documented defaults', () => {
    const { site } = siteFromText(JSON.stringify(MINIMAL));
    expect(site.earth_radius_m).toBe(SITE_DEFAULTS.earth_radius_m);
    expect(site.latitude_rad).toBe(SITE_DEFAULTS.latitude_deg * RAD_PER_DEG);
    expect(site.cool_skin).toBe(false);
    expect(site.aperture_m).toBeUndefined();
    expect(siteFromText(JSON.stringify({ ...MINIMAL, observer: { height_m: 6, aperture_mm: 50 } })).site.aperture_m).toBe(0.05);
  });

  it('names an unknown key with its path', () => {
    const error = siteErrorOf({ ...MINIMAL, landmark: { ...MINIMAL.landmark, colour: 'white' } });
    expect(error.message).toBe('site.landmark.colour: unknown key (not part of the site format)');
  });

  it('names a value out of range with the allowed range and unit', () => {
    const error = siteErrorOf({ ...MINIMAL, measurements: { air_temperature_height_m: 0.1, wind_height_m: 10 } });
    expect(error.message).toBe('site.measurements.air_temperature_height_m: 0.1 is out of range: allowed 0.5..100 m');
    expect(siteErrorOf({ ...MINIMAL, landmark: { range_m: 15000, height_m: 0 } }).message).toMatch(/landmark height must be above 0 m/);
  });

  it('lists every problem, and names a missing section', () => {
    const error = siteErrorOf({ name: 'x', observer: { height_m: -1 } });
    expect(error.problems.length).toBeGreaterThanOrEqual(3);
    expect(error.problems.some((p) => p.startsWith('site.measurements'))).toBe(true);
    expect(error.problems.some((p) => p.startsWith('site.landmark'))).toBe(true);
  });

  it('reports malformed JSON and an unreadable file as site errors', async () => {
    expect(() => siteFromText('{ "name": ')).toThrow(SiteError);
    await expect(loadSiteFile(join(import.meta.dirname, 'no-such-site.json'))).rejects.toThrow(/cannot read site file .*ENOENT/);
  });
});
