import type { ComfortGrading, Metrics } from '../../schemas/metrics.ts';
import type { RoadSummary } from '../../schemas/run.ts';

/**
 * ISO 2631-1:1997 §6.2.1 (from memory): the basic evaluation by weighted RMS is normally enough
 * when the crest factor of the weighted acceleration is at most 9; above it the standard asks for
 * the running RMS (MTVV) or the fourth-power method (VDV).
 */
export const CREST_FACTOR_LIMIT = 9;

/** Road kinds that are one event on a level road: the run's length sets their RMS, not the event. */
const eventKinds: ReadonlySet<RoadSummary['kind']> = new Set(['bump', 'pothole', 'kerb']);

export function isEventRoad(kind: RoadSummary['kind']): boolean {
  return eventKinds.has(kind);
}

/** The crest factor the rule is judged on: of the weighted signal, or, for runs saved before it was kept, of the raw one. */
export function judgedCrest(m: Metrics): number {
  return m.bodyAccelWkCrest ?? m.bodyAccelCrest;
}

/**
 * How a run's comfort may be judged. `lead`: which figures come first (`event`: peak, VDV, MTVV,
 * settling time; `rms`: the weighted RMS). `verdict`: the Annex C comfort reaction, or null when
 * the RMS method does not apply, with the plain reason in `why`.
 */
export interface RideJudgement {
  lead: 'event' | 'rms';
  verdict: ComfortGrading | null;
  crest: number;
  /** True when the crest factor is above the ISO limit. */
  crestAboveLimit: boolean;
  why: string | null;
}

export function rideJudgement(kind: RoadSummary['kind'], m: Metrics): RideJudgement {
  const crest = judgedCrest(m);
  const crestAboveLimit = crest > CREST_FACTOR_LIMIT;
  const event = isEventRoad(kind);
  const reasons: string[] = [];
  if (crestAboveLimit) {
    reasons.push(`Crest factor ${crest.toFixed(1)} is above ${CREST_FACTOR_LIMIT}: the basic RMS method of ISO 2631-1 is not sufficient here; judge by peak, VDV and MTVV.`);
  }
  if (event) reasons.push('A single event: its RMS depends on how long the run is, so no RMS comfort verdict is given.');
  return {
    lead: event ? 'event' : 'rms',
    verdict: crestAboveLimit || event ? null : m.comfort,
    crest,
    crestAboveLimit,
    why: reasons.length ? reasons.join(' ') : null,
  };
}
