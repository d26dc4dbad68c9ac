import { describe, expect, it } from 'vitest';
import { outlookForObservation, referenceAtmosphere, referenceTable } from '../../sim/analysis/outlook.js';
import { horizon } from '../../sim/analysis/dip.js';
import { TOWERING_THRESHOLD } from '../../sim/analysis/looming.js';
import { resolveAirColumn } from '../../sim/atmosphere/resolve.js';
import { RAD_PER_ARCMIN } from '../../sim/constants.js';
import { observation, TEST_SITE } from '../outlook/fixtures.js';
import { expectClose } from '../support/close.js';

const SITE = TEST_SITE;

/** The eye's resolving limit, 1′ (common practice, no source; REFERENCES.md §8): the least looming anyone notices. */
const NOTICEABLE_RAD = RAD_PER_ARCMIN;

describe('the reference air of the outlook', () => {
  it('passes through the observed air temperature at the sensor height', () => {
    const obs = observation(17.3, 12, 5, 0.7);
    const column = resolveAirColumn(referenceAtmosphere(obs, SITE));
    // An identity of the construction; 1e-9 K leaves room for rounding only.
    expectClose(column.temperature_K(SITE.air_temperature_height_m), obs.air_temperature_K, { abs: 1e-9 });
  });

  it('gives the exact dip of REFERENCES.md §5.3 for 10 m over a 283.15 K sea at 1010 hPa, dry: 5.5314′', () => {
    // REFERENCES.md §5.3 (independent computation from the Bouguer invariant, US 1976 lapse,
    // Ciddor at 550 nm, dry air, hydrostatic pressure). Sea-level temperature 283.15 K means an
    // air temperature 0.065 K lower at the 10 m sensor (US 1976 lapse 6.5 K/km).
    const obs = observation(10 - 0.065, 10, 5, 0, 1010);
    const site = { ...SITE, observer_height_m: 10 };
    const found = horizon(referenceTable(obs, site), site.observer_height_m, site.earth_radius_m);
    // ±0.002′: the tolerance REFERENCES.md §5.3 quotes for the engine test.
    expectClose(-found.horizon_elevation_rad / RAD_PER_ARCMIN, 5.5314, { abs: 0.002 });
  });
});

describe('the outlook of one observation', () => {
  it('reports the Obukhov length of the COARE 3.5 stable case of REFERENCES.md §7.5 and calls it very stable', () => {
    // REFERENCES.md §7.5 (independent computation with NOAA-PSL coare35vn.py): sea 10 °C, air 15 °C,
    // u = 5 m/s, RH 80 %, 1013 mb, sensors at 10 m, lat 45°, no cool skin → L = +6.383 m.
    const f = outlookForObservation(observation(15, 10, 5, 0.8), SITE);
    // 1e-3 relative: the table gives four digits; the iteration here runs to convergence (10 passes in the reference code).
    expectClose(f.obukhov_length_m, 6.383, { rel: 1e-3 });
    expect(f.stability).toBe('very stable');
    expectClose(f.air_sea_difference_K, 5, { abs: 1e-9 });
  });

  it('makes warm air over cold water loom: landmark and horizon seen higher, by more than the eye resolves', () => {
    for (const obs of [observation(15, 10, 5, 0.8), observation(13, 10, 7, 0.8)]) {
      const f = outlookForObservation(obs, SITE);
      expect(f.landmark_shift_rad).not.toBeNull();
      expect(f.landmark_shift_rad!).toBeGreaterThan(NOTICEABLE_RAD);
      expect(f.horizon_shift_rad).toBeGreaterThan(NOTICEABLE_RAD);
      expect(f.label).toMatch(/lifted/);
      expect(f.strength).toBeGreaterThan(0.3);
      expect(f.strength).toBeLessThanOrEqual(1);
    }
  });

  it('makes cold air over warm water sink: landmark and horizon seen lower, the base mirrored below', () => {
    const f = outlookForObservation(observation(15, 20, 5, 0.8), SITE);
    expect(f.stability).toBe('very unstable');
    expect(f.landmark_shift_rad!).toBeLessThan(-0.5 * NOTICEABLE_RAD);
    expect(f.horizon_shift_rad).toBeLessThan(-NOTICEABLE_RAD);
    expect(f.landmark.lowest_visible_height_m).toBeGreaterThan(f.reference_landmark.lowest_visible_height_m);
    expect(f.landmark_magnification!).toBeGreaterThan(1 + TOWERING_THRESHOLD);
    expect(f.resolvable_image_count).toBeGreaterThanOrEqual(2);
    expect(f.label).toMatch(/mirrored below/);
    expect(f.label).toMatch(/horizon lowered/);
  });

  it('leaves neutral air close to the reference: the landmark shift of a dry-adiabatic layer', () => {
    // Neutral: air potential temperature equal to the sea's (θ = T + 0.0098 z, REFERENCES.md §7.1),
    // strong wind, humid air. The layer then has the dry-adiabatic lapse of the COARE convention,
    // −0.0098 K/m, where the reference has −0.0065 K/m. With the ray-curvature formula of
    // REFERENCES.md §5.1, κ = [(n − 1)/T](0.034163 K/m + dT/dz), the curvature changes by
    // Δκ = [(n − 1)/T](−0.0033 K/m) and a point D away is seen lower by Δκ·D/2. n − 1 = 2.8185e-4 at
    // 283.15 K and 1010 hPa (REFERENCES.md §5.1 table, 550 nm, dry) scaled to 1013 hPa.
    const obs = observation(10 - 0.098, 10, 12, 0.95);
    const f = outlookForObservation(obs, SITE);
    expect(f.stability).toBe('near neutral');
    const nm1 = 2.81852e-4 * (1013 / 1010) * (283.15 / obs.air_temperature_K);
    const estimate_rad = ((nm1 / obs.air_temperature_K) * -0.0033 * SITE.landmark_range_m) / 2;
    // 0.01′ (9 % of the shift): the estimate leaves out the humidity gradient over the sea and the
    // small buoyancy flux that humidity alone drives; each moves the shift by a few per cent.
    expectClose(f.landmark_shift_rad! / RAD_PER_ARCMIN, estimate_rad / RAD_PER_ARCMIN, { abs: 0.01 });
    // Half the eye's 1′: neutral rows must read as ordinary.
    expect(Math.abs(f.horizon_shift_rad)).toBeLessThan(0.5 * NOTICEABLE_RAD);
    // Within the 5 % below which looming.ts reports no towering or stooping (its reporting choice):
    // the part seen in both reaches down to rays grazing the humid air at the sea, where the two differ most.
    expectClose(f.landmark_magnification!, 1, { abs: TOWERING_THRESHOLD });
    expect(f.label).toBe('ordinary view');
  });
});
