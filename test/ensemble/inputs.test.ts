import { describe, expect, it } from 'vitest';
import { ensembleInputs, inputLabel, memberFile } from '../../server/ensemble/inputs.js';
import { validateScenarioFile } from '../../server/scenario/load.js';
import { LIMITS } from '../../server/scenario/schema.js';

const FILE = validateScenarioFile({
  name: 'Inputs test (invented)',
  observer: { height_m: { normal: { mean: 3, sd: 5 } } },
  target: { range_m: { uniform: { min: 9000, max: 11000 } }, height_m: 12 },
  atmosphere: {
    relative_humidity: { choice: [0.5, 0.7] },
    profile: [
      { height_m: 0, temperature_C: 4 },
      { height_m: { normal: { mean: 20, sd: 2 } }, temperature_C: { normal: { mean: 9, sd: 1 } } },
    ],
  },
});

describe('ensembleInputs', () => {
  it('lists every distribution in file order with a plain label and the unit of the file', () => {
    const inputs = ensembleInputs(FILE);
    expect(inputs.map((i) => [i.path, i.label, i.unit])).toEqual([
      ['observer.height_m', 'observer (eye) height', 'm'],
      ['target.range_m', 'target range', 'm'],
      ['atmosphere.relative_humidity', 'relative humidity', '(fraction)'],
      ['atmosphere.profile.1.height_m', 'profile node 2 height', 'm'],
      ['atmosphere.profile.1.temperature_C', 'profile node 2 temperature', '°C'],
    ]);
  });

  it("truncates a normal to the field's allowed range", () => {
    const [observer] = ensembleInputs(FILE);
    expect(observer.distribution).toEqual({ kind: 'normal', mean: 3, sd: 5, min: LIMITS.observer_height_m[0], max: LIMITS.observer_height_m[1] });
  });

  it('labels bulk fields by their last key', () => {
    expect(inputLabel('atmosphere.bulk.sea_temperature_C')).toBe('sea temperature');
  });
});

describe('memberFile', () => {
  it('writes the sampled values at their paths and leaves the original file unchanged', () => {
    const inputs = ensembleInputs(FILE);
    const member = memberFile(FILE, inputs, [4, 10500, 0.7, 22, 10]);
    expect(member.observer.height_m).toBe(4);
    expect(member.target.range_m).toBe(10500);
    expect(member.target.height_m).toBe(12);
    expect(member.atmosphere).toMatchObject({ relative_humidity: 0.7, profile: [{ height_m: 0, temperature_C: 4 }, { height_m: 22, temperature_C: 10 }] });
    expect(FILE.observer.height_m).toEqual({ normal: { mean: 3, sd: 5 } });
    expect(validateScenarioFile(member)).toEqual(member);
  });
});
