import { describe, expect, it } from 'vitest';
import { CELSIUS_OFFSET_K } from '../../sim/constants.js';
import { initialCoolSkin, updateCoolSkin, type CoolSkinSetup } from '../../sim/atmosphere/surface-cool-skin.js';
import { expectClose } from '../support/close.js';

// The published check of the cool skin (COARE 3.5 test row 1, dter = 0.310920 K) is in
// surface-flux.test.ts, where the full iteration supplies the fluxes. Here: properties of one update.

const setup: CoolSkinSetup = {
  sea_temperature_K: 20 + CELSIUS_OFFSET_K,
  air_density_kg_per_m3: 1.2,
  latent_heat_J_per_kg: 2.45e6,
  shortwave_down_W_per_m2: 0,
  longwave_down_W_per_m2: 350,
  gravity_m_per_s2: 9.81,
  humidity_slope_per_K: 1e-3,
};

describe('cool skin update (Fairall et al. 1996 as coded in COARE 3.5)', () => {
  it('cools the skin more when the sky sends less long-wave radiation', () => {
    const previous = initialCoolSkin(setup);
    const warmSky = updateCoolSkin({ ...setup, longwave_down_W_per_m2: 420 }, previous, 0.2, 10, 80);
    const coldSky = updateCoolSkin({ ...setup, longwave_down_W_per_m2: 280 }, previous, 0.2, 10, 80);
    expect(warmSky.depression_K).toBeGreaterThan(0);
    expect(coldSky.depression_K).toBeGreaterThan(warmSky.depression_K);
  });
  it('gives no depression when the turbulent fluxes balance the net long-wave gain', () => {
    const previous = initialCoolSkin(setup);
    const skinK = setup.sea_temperature_K - previous.depression_K;
    const netLongwave = 0.97 * (5.67e-8 * skinK ** 4 - setup.longwave_down_W_per_m2);
    const r = updateCoolSkin(setup, previous, 0.2, -netLongwave, 0);
    // Exact balance up to rounding of a 400 W/m² sum: 1e-12 K.
    expectClose(r.depression_K, 0, { abs: 1e-12 });
  });
  it('keeps the conductive sublayer at most 1 cm thick when the surface gains heat', () => {
    const r = updateCoolSkin(setup, initialCoolSkin(setup), 0.001, -300, -50);
    expect(r.thickness_m).toBeLessThanOrEqual(0.01);
    expect(r.depression_K).toBeLessThan(0);
  });
  it('scales the humidity depression with the Clausius-Clapeyron slope', () => {
    const r = updateCoolSkin(setup, initialCoolSkin(setup), 0.2, 10, 80);
    expectClose(r.humidity_depression, setup.humidity_slope_per_K * r.depression_K, { rel: 1e-15 });
  });
});
