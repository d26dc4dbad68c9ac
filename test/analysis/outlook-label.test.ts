import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { LABEL_SCALES, outlookLabel, stabilityClass, type LabelFindings } from '../../sim/analysis/outlook-label.js';
import { RAD_PER_ARCMIN } from '../../sim/constants.js';
import { expectClose } from '../support/close.js';

/** Strengths are ratios of angles computed in double precision: 1e-12 leaves room for rounding only. */
const STRENGTH_TOL = 1e-12;

/** An ordinary row: nothing differs from the reference. */
const ORDINARY: LabelFindings = {
  air_sea_difference_K: 0,
  landmark_shift_rad: 0,
  landmark_magnification: 1,
  landmark_seen: true,
  reference_landmark_seen: true,
  image_count: 1,
  horizon_shift_rad: 0,
  false_horizon: false,
};

describe('stability classes', () => {
  it('class ζ = 10 m / L at the round bounds 0.1 and 1, inclusive on the milder side', () => {
    expect(stabilityClass(Infinity)).toBe('near neutral');
    expect(stabilityClass(-Infinity)).toBe('near neutral');
    expect(stabilityClass(100)).toBe('near neutral');
    expect(stabilityClass(-100)).toBe('near neutral');
    expect(stabilityClass(99)).toBe('stable');
    expect(stabilityClass(10)).toBe('stable');
    expect(stabilityClass(9.9)).toBe('very stable');
    expect(stabilityClass(-10)).toBe('unstable');
    expect(stabilityClass(-9.9)).toBe('very unstable');
    expect(stabilityClass(Number.NaN)).toBe('near neutral');
  });

  it('put the COARE 3.5 cases of REFERENCES.md §7.5 in the expected classes', () => {
    // L from REFERENCES.md §7.5 (independent computation with the NOAA-PSL coare35vn.py reference code).
    expect(stabilityClass(6.383)).toBe('very stable'); // warm air over a 10 °C sea, u = 5 m/s
    expect(stabilityClass(-8.587)).toBe('very unstable'); // cool air over a 20 °C sea
    expect(stabilityClass(-358.07)).toBe('near neutral'); // 15 °C air over 15.2 °C, u = 8 m/s
  });
});

/** A row whose landmark is not seen, though it is in the reference. */
const outOfSight = (): LabelFindings => ({ ...ORDINARY, landmark_shift_rad: null, landmark_magnification: null, landmark_seen: false, image_count: 0 });

describe('outlook labels', () => {
  it('call a row with shifts below the eye’s 1′ an ordinary view, with a small strength', () => {
    const { label, strength } = outlookLabel({ ...ORDINARY, landmark_shift_rad: 0.5 * RAD_PER_ARCMIN, landmark_magnification: 1.1 });
    expect(label).toBe('ordinary view');
    // 0.5′ of a 6′ full scale; log2(1.1) = 0.1375 of a full doubling: the larger counts.
    expectClose(strength, Math.log2(1.1), { abs: STRENGTH_TOL });
  });

  it('name looming and sinking and scale the strength by the shift (6′ is full strength)', () => {
    const up = outlookLabel({ ...ORDINARY, landmark_shift_rad: 3 * RAD_PER_ARCMIN });
    expect(up.label).toBe('lifted');
    expectClose(up.strength, 0.5, { abs: STRENGTH_TOL });
    const down = outlookLabel({ ...ORDINARY, landmark_shift_rad: -9 * RAD_PER_ARCMIN });
    expect(down.label).toBe('sunk');
    expect(down.strength).toBe(1);
  });

  it('name towering and stooping beyond a factor 1.25', () => {
    expect(outlookLabel({ ...ORDINARY, landmark_magnification: 1.5 }).label).toBe('stretched tall');
    expect(outlookLabel({ ...ORDINARY, landmark_magnification: 0.5 }).label).toBe('squashed');
    expect(outlookLabel({ ...ORDINARY, landmark_magnification: 0.5 }).strength).toBe(1);
    expect(outlookLabel({ ...ORDINARY, landmark_magnification: 0 }).strength).toBe(1);
  });

  it('call extra images stacked over cold water and mirrored below over warm water', () => {
    const stacked = outlookLabel({ ...ORDINARY, image_count: 3, air_sea_difference_K: 4 });
    expect(stacked.label).toBe('stacked images');
    expect(stacked.strength).toBe(LABEL_SCALES.THIRD_IMAGE);
    const mirrored = outlookLabel({ ...ORDINARY, image_count: 2, air_sea_difference_K: -2 });
    expect(mirrored.label).toBe('mirrored below');
    expect(mirrored.strength).toBe(LABEL_SCALES.SECOND_IMAGE);
  });

  it('say when the landmark comes into view or drops out of sight', () => {
    const into = outlookLabel({ ...ORDINARY, landmark_shift_rad: null, landmark_magnification: null, reference_landmark_seen: false });
    expect(into.label).toBe('lifted into view');
    expect(into.strength).toBe(1);
    const out = outlookLabel({ ...ORDINARY, landmark_shift_rad: null, landmark_magnification: null, landmark_seen: false, image_count: 0 });
    expect(out.label).toBe('sunk out of sight');
    // Over cold water a duct around the eye can raise the sea's edge above the landmark.
    const behind = outlookLabel({ ...outOfSight(), false_horizon: true, horizon_shift_rad: 8 * RAD_PER_ARCMIN });
    expect(behind.label).toBe('hidden behind raised horizon');
    expect(behind.strength).toBe(1);
  });

  it('name a false horizon only when it stands at least 1′ above the reference horizon', () => {
    expect(outlookLabel({ ...ORDINARY, false_horizon: true, horizon_shift_rad: 0.2 * RAD_PER_ARCMIN }).label).toBe('ordinary view');
    const raised = outlookLabel({ ...ORDINARY, false_horizon: true, horizon_shift_rad: 2 * RAD_PER_ARCMIN });
    expect(raised.label).toBe('false horizon');
    expect(raised.strength).toBe(LABEL_SCALES.FALSE_HORIZON);
  });

  it('name a horizon moved by 1′ or more when it is not a false one, and count the move in the strength', () => {
    const lowered = outlookLabel({ ...ORDINARY, horizon_shift_rad: -1.5 * RAD_PER_ARCMIN });
    expect(lowered.label).toBe('horizon lowered');
    expectClose(lowered.strength, 0.25, { abs: STRENGTH_TOL });
    expect(outlookLabel({ ...ORDINARY, horizon_shift_rad: 1.2 * RAD_PER_ARCMIN }).label).toBe('horizon raised');
  });

  it('join at most three parts, the strongest kinds first', () => {
    const label = outlookLabel({
      ...ORDINARY,
      air_sea_difference_K: 6,
      image_count: 2,
      landmark_shift_rad: 4 * RAD_PER_ARCMIN,
      landmark_magnification: 2,
      false_horizon: true,
      horizon_shift_rad: 5 * RAD_PER_ARCMIN,
    }).label;
    expect(label).toBe('stacked images, lifted, stretched tall');
  });

  it('keep the strength within 0..1 for any findings, odd numbers included', () => {
    const angle = fc.oneof(fc.double({ min: -0.1, max: 0.1, noNaN: true }), fc.constantFrom(Number.NaN, Infinity, -Infinity));
    fc.assert(
      fc.property(
        fc.record({
          air_sea_difference_K: fc.double({ min: -30, max: 30, noNaN: true }),
          landmark_shift_rad: fc.option(angle),
          landmark_magnification: fc.option(fc.oneof(fc.double({ min: 0, max: 1e6, noNaN: true }), fc.constantFrom(Number.NaN, Infinity))),
          landmark_seen: fc.boolean(),
          reference_landmark_seen: fc.boolean(),
          image_count: fc.integer({ min: 0, max: 9 }),
          horizon_shift_rad: angle,
          false_horizon: fc.boolean(),
        }),
        (f) => {
          const { strength, label } = outlookLabel(f);
          expect(strength).toBeGreaterThanOrEqual(0);
          expect(strength).toBeLessThanOrEqual(1);
          expect(label.length).toBeGreaterThan(0);
          expect(label.split(', ').length).toBeLessThanOrEqual(3);
        },
      ),
    );
  });
});
