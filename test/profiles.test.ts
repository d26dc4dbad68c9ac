import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadScenarioFile } from '../server/scenario/load.js';
import { buildMedium } from '../sim/atmosphere/medium.js';

const dir = join(import.meta.dirname, '..', 'profiles');
const scenarioFiles = readdirSync(dir).filter((f) => f.endsWith('.json'));

describe('the invented scenarios in profiles/', () => {
  it('include at least the six kinds the viewer issue asks for', () => {
    expect(scenarioFiles.length).toBeGreaterThanOrEqual(6);
  });

  for (const file of scenarioFiles) {
    it(`${file} loads through the scenario schema, says it is invented, and builds a medium`, async () => {
      const { scenario } = await loadScenarioFile(join(dir, file));
      expect(scenario.name).toMatch(/invented/i);
      expect(scenario.description?.length ?? 0).toBeGreaterThan(20);
      const medium = buildMedium(scenario);
      expect(medium.table.top_m).toBeGreaterThan(scenario.observer.height_m);
    });
  }
});
