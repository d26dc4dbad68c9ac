/**
 * A small cache of built media, so the requests one viewer edit makes (air, trace, findings, view)
 * build the medium of a scenario once. Keyed by the scenario's atmosphere and optics (all that
 * buildMedium reads); least recently used entries go first. Media are read-only once built. Also
 * the source of the US 1976 reference media of findings (server/service/reference-media.ts).
 */
import { buildMedium, type Medium } from '../../sim/atmosphere/medium.js';
import type { Scenario } from '../../sim/scenario.js';

/** Media kept: a few per viewer tab, a few tabs. */
export const MEDIUM_CACHE_SIZE = 16;

export class MediumCache {
  private readonly entries = new Map<string, Medium>();
  hits = 0;
  misses = 0;

  constructor(private readonly capacity = MEDIUM_CACHE_SIZE) {}

  /** The medium of a scenario: from the cache, or built (and kept). Throws what buildMedium throws. */
  get(scenario: Scenario): Medium {
    const key = JSON.stringify([scenario.atmosphere, scenario.optics]);
    const found = this.entries.get(key);
    if (found) {
      this.hits++;
      this.entries.delete(key);
      this.entries.set(key, found);
      return found;
    }
    this.misses++;
    const medium = buildMedium(scenario);
    this.entries.set(key, medium);
    if (this.entries.size > this.capacity) this.entries.delete(this.entries.keys().next().value as string);
    return medium;
  }
}
