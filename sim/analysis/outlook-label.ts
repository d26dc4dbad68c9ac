/**
 * Plain words for an outlook row: the stability class of the air over the sea, and a short label
 * of what an observer would notice, with a 0–1 strength. The words, classes and scales are
 * Loomline's own choices, stated here; nothing in them is a published scale.
 */
import { EYE_RESOLUTION_RAD } from './resolution.js';

/** Stability classes by ζ = z/L at STABILITY_REFERENCE_HEIGHT_M. */
export type StabilityClass = 'very unstable' | 'unstable' | 'near neutral' | 'stable' | 'very stable';

/** Height at which ζ = z/L is classed, m: 10 m, the usual reference height of marine fluxes (common practice, no source). */
export const STABILITY_REFERENCE_HEIGHT_M = 10;

/**
 * Class boundaries on |ζ| (dimensionless): |ζ| ≤ 0.1 near neutral, 0.1..1 (un)stable, above 1 very
 * (un)stable. Our own round numbers: below |ζ| = 0.1 the stability corrections ψ(ζ) are under
 * about 0.5 (REFERENCES.md §7.2 tables), a few per cent of ln(z/z₀); above |ζ| = 1 they dominate.
 */
export const STABILITY_BOUNDS = { nearNeutral: 0.1, strong: 1 } as const;

/**
 * Stability class of the surface layer.
 * @param obukhov_length_m Obukhov length L, m (negative unstable, positive stable, ±Infinity neutral).
 * @returns the class of ζ = 10 m / L (STABILITY_BOUNDS); NaN counts as near neutral.
 */
export function stabilityClass(obukhov_length_m: number): StabilityClass {
  const zeta = STABILITY_REFERENCE_HEIGHT_M / obukhov_length_m;
  const size = Math.abs(zeta);
  if (!(size > STABILITY_BOUNDS.nearNeutral)) return 'near neutral';
  if (zeta > 0) return size > STABILITY_BOUNDS.strong ? 'very stable' : 'stable';
  return size > STABILITY_BOUNDS.strong ? 'very unstable' : 'unstable';
}

/** What the label is made from: the findings of one row against the reference atmosphere. */
export interface LabelFindings {
  /** Air minus sea temperature, K (positive: warm air over cold water). */
  air_sea_difference_K: number;
  /** Landmark top's apparent elevation minus the reference's, rad; null when either does not see it. */
  landmark_shift_rad: number | null;
  /** Vertical magnification at the landmark's top relative to the reference; null when not seen. */
  landmark_magnification: number | null;
  /** Whether the landmark's top is seen at all, in the row's air and in the reference air. */
  landmark_seen: boolean;
  reference_landmark_seen: boolean;
  /** Images of the landmark that an observer can tell apart (taller than the resolving limit). */
  image_count: number;
  /** Apparent horizon elevation minus the reference's, rad. */
  horizon_shift_rad: number;
  false_horizon: boolean;
}

/**
 * Scales of the strength (our own): a shift of the landmark or of the horizon by FULL_SHIFT_RAD
 * (6′), a magnification of 2 or ½, three images, or a landmark
 * brought into or out of view each count as a full-strength (1) effect; a second image counts 0.6;
 * a false horizon at least 0.4, and only when it stands at least NOTICEABLE_SHIFT_RAD above the
 * reference horizon (a duct a few millimetres deep also makes the horizon "false", but nobody
 * sees it). Shifts and stretches below NOTICEABLE_* are not named in the label.
 */
export const LABEL_SCALES = {
  FULL_SHIFT_RAD: 6 * EYE_RESOLUTION_RAD,
  /** The eye's resolving limit, 1′ (resolution.ts; common practice, no source). */
  NOTICEABLE_SHIFT_RAD: EYE_RESOLUTION_RAD,
  /** log2 of a magnification that counts as full strength (2 or ½). */
  FULL_LOG2_MAGNIFICATION: 1,
  /** Magnification beyond 1.25 or below 1/1.25 is named (our own threshold). */
  NOTICEABLE_MAGNIFICATION: 1.25,
  SECOND_IMAGE: 0.6,
  THIRD_IMAGE: 1,
  INTO_OR_OUT_OF_VIEW: 1,
  FALSE_HORIZON: 0.4,
} as const;

/** A row's label: a few plain words, and how strong the effect is (0 ordinary .. 1 striking). */
export interface OutlookLabel {
  label: string;
  strength: number;
}

/**
 * Labels one row.
 * @param f the findings (LabelFindings), angles in rad.
 * @returns label (at most three comma-separated parts, or "ordinary view") and strength in 0..1:
 *   the largest of the part scores of LABEL_SCALES, clipped to 1 (NaN scores 0, Infinity 1).
 */
export function outlookLabel(f: LabelFindings): OutlookLabel {
  const s = LABEL_SCALES;
  const parts: string[] = [];
  const scores: number[] = [0];
  if (f.image_count >= 2) {
    parts.push(f.air_sea_difference_K >= 0 ? 'stacked images' : 'mirrored below');
    scores.push(f.image_count >= 3 ? s.THIRD_IMAGE : s.SECOND_IMAGE);
  }
  const hiddenByRaisedSea = !f.landmark_seen && f.reference_landmark_seen && f.horizon_shift_rad > 0;
  if (f.landmark_seen !== f.reference_landmark_seen) {
    parts.push(f.landmark_seen ? 'lifted into view' : hiddenByRaisedSea ? 'hidden behind raised horizon' : 'sunk out of sight');
    scores.push(s.INTO_OR_OUT_OF_VIEW);
  }
  const shift = f.landmark_shift_rad;
  if (shift !== null && Math.abs(shift) >= s.NOTICEABLE_SHIFT_RAD) parts.push(shift > 0 ? 'lifted' : 'sunk');
  if (shift !== null) scores.push(Math.abs(shift) / s.FULL_SHIFT_RAD);
  const m = f.landmark_magnification;
  if (m !== null && m >= 0) {
    if (m >= s.NOTICEABLE_MAGNIFICATION) parts.push('stretched tall');
    else if (m <= 1 / s.NOTICEABLE_MAGNIFICATION) parts.push('squashed');
    scores.push(Math.abs(Math.log2(m)) / s.FULL_LOG2_MAGNIFICATION);
  }
  const horizon = f.horizon_shift_rad;
  if (f.false_horizon && horizon >= s.NOTICEABLE_SHIFT_RAD) {
    if (!hiddenByRaisedSea) parts.push('false horizon');
    scores.push(s.FALSE_HORIZON);
  } else if (Math.abs(horizon) >= s.NOTICEABLE_SHIFT_RAD && !hiddenByRaisedSea) {
    parts.push(horizon > 0 ? 'horizon raised' : 'horizon lowered');
  }
  scores.push(Math.abs(horizon) / s.FULL_SHIFT_RAD);
  const strength = Math.min(1, Math.max(...scores.map((x) => (Number.isNaN(x) ? 0 : x))));
  return { label: parts.length > 0 ? parts.slice(0, 3).join(', ') : 'ordinary view', strength };
}
