import type { Clearance } from '../clearance/types';
import { evaluateSpot, type EvaluatedSpot } from '../plan/evaluate-spot';
import type { AntennaSpot, ReviewDecision } from '../schemas/records';
import { spotFingerprint } from './fingerprint';
import { siteFileFromRecords, type SiteRecords } from './records-to-site-file';
import { reviewSpot, type ReviewResult, type SpotReview } from './review-status';

/*
 * One place that turns the records of an event into each spot's review: the app's plan, review and sheet
 * screens and the server's check of an arriving decision all call this, so they judge a spot the same way.
 */

export type SpotEvaluation = {
  spot: AntennaSpot;
  /** The engine's full checks of this spot now; null when it can no longer be built (support gone, span too long). */
  evaluated: EvaluatedSpot | null;
  results: ReviewResult[];
  fingerprint: string;
  supportLabels: string[];
  review: SpotReview;
};

export function reviewResultsOf(clearances: readonly Clearance[]): ReviewResult[] {
  return clearances.map((c) => ({ key: c.key, level: c.level, message: c.message, rule: c.rule, source: c.source }));
}

/** The review of every live spot of an event, with the site file the engine was given and its notes. */
export function evaluateEventSpots(records: SiteRecords, spots: readonly AntennaSpot[], decisions: readonly ReviewDecision[]) {
  const build = siteFileFromRecords(records);
  const label = new Map(records.supports.map((s) => [s.id, s.label]));
  const out: SpotEvaluation[] = [];
  for (const spot of spots) {
    if (spot.deletedAt !== null) continue;
    // The recorded leg bearing is the wire the lead chose: judge that one, not whichever direction ranks best now.
    const legAzimuthDeg = spot.shape === 'inverted-v' ? spot.legAzimuthDeg : null;
    const evaluated = evaluateSpot(build.file, { stationId: spot.stationId, band: spot.band, shape: spot.shape, supportIds: spot.supportIds, legAzimuthDeg });
    const results = evaluated ? reviewResultsOf(evaluated.candidate.clearances) : [];
    const station = records.stations.find((s) => s.id === spot.stationId) ?? null;
    const fingerprint = spotFingerprint({
      site: records.site,
      supportIds: spot.supportIds,
      supports: records.supports,
      hazards: records.hazards,
      legAzimuthDeg,
      station,
      operatingPositions: records.operatingPositions,
    });
    const supportLabels = spot.supportIds.map((id) => label.get(id) ?? 'A removed support');
    const mine = decisions.filter((d) => d.spotId === spot.id);
    const review = reviewSpot({ spot, results, decisions: mine, currentFingerprint: fingerprint, supportLabels });
    if (!evaluated) review.reasons.push('This spot can no longer be built from the current records (a support was removed, lost its height, or the span no longer fits the wire).');
    out.push({ spot, evaluated, results, fingerprint, supportLabels, review });
  }
  return { spots: out, notes: build.notes, file: build.file };
}
