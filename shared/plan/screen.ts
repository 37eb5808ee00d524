import { tallyPowerLines, type LevelTally } from '../clearance/power-line';
import { countFallZoneOverlaps } from '../clearance/public-area';
import type { ClearanceLevel } from '../clearance/types';
import { type CoaxChooser, nearestRun, wayLossDb } from '../coax/coax-run';
import { matchedLossDb, swrExtraLossDb } from '../coax/loss';
import { closestPointOnShape, planeBearingDeg, pointSegmentDistanceM, segmentShapeDistanceM } from '../clearance/planar';
import { type ExposureDistances, exposureDistances } from '../exposure/oet65';
import type { SpanGeometry } from './candidates';
import { EXPOSURE_GAIN_FLOOR_DBI, exposureInputFor, footprintOf } from './evaluate';
import type { PlanOptions } from './options';
import type { PatternSummary } from './physics';
import { scoreValue } from './score';
import type { AntennaNeed, SiteModel } from './site-model';

const peakCache = new WeakMap<readonly number[], Map<string, { peakGainDbi: number; d: ExposureDistances }>>();

/** Exposure distances at the cut's peak gain, once per need and azimuth cut. */
function peakDistances(geom: SpanGeometry, az: readonly number[], need: AntennaNeed, model: SiteModel, opts: PlanOptions) {
  let byNeed = peakCache.get(az);
  if (!byNeed) peakCache.set(az, (byNeed = new Map()));
  let hit = byNeed.get(need.key + '|' + opts.transmitFraction);
  if (!hit) {
    const input = exposureInputFor(geom, az, need, model, opts);
    hit = { peakGainDbi: input.gainDbi, d: exposureDistances(input) };
    byNeed.set(need.key + '|' + opts.transmitFraction, hit);
  }
  return hit;
}

/**
 * How many exposure results need review, as exposureCheck decides them: the public result when no public
 * area is recorded or one lies inside its distance (taken with the gain toward it), and the operators'
 * result when an operating position lies inside the controlled distance.
 */
function exposureReviews(geom: SpanGeometry, az: readonly number[], need: AntennaNeed, model: SiteModel, opts: PlanOptions): number {
  const { peakGainDbi, d } = peakDistances(geom, az, need, model, opts);
  const uPeak = d.distanceM.uncontrolled;
  let reviews = model.publicAreas.length === 0 ? 1 : 0;
  for (const area of model.publicAreas) {
    if (reviews > 0) break;
    let dist = Infinity;
    for (const [a, b] of geom.wire) dist = Math.min(dist, segmentShapeDistanceM(a, b, area.shape));
    if (dist >= uPeak) continue; // outside even at peak gain
    const toward = closestPointOnShape(geom.feed, area.shape);
    const rel = Math.round(planeBearingDeg(geom.feed, toward) - geom.wireAzimuthDeg);
    const g = Math.max(EXPOSURE_GAIN_FLOOR_DBI, az[((rel % 360) + 360) % 360]);
    if (dist < uPeak * 10 ** ((g - peakGainDbi) / 20)) reviews = 1;
  }
  const cPeak = d.distanceM.controlled;
  if (model.operatingPositions.length === 0) return reviews + 1; // cannot be checked
  for (const p of model.operatingPositions) {
    let dist = Infinity;
    for (const [a, b] of geom.wire) dist = Math.min(dist, pointSegmentDistanceM(p.at, a, b));
    if (dist < cPeak) return reviews + 1;
  }
  return reviews;
}

export type Screened = { level: ClearanceLevel; reviews: number; score: number };

/**
 * The level and score evaluateCandidate would give, computed without building any result or message, so
 * that every candidate can be ranked cheaply and only the few shown or chosen are written out in full.
 * plan-site.test.ts checks that the two agree on every candidate of a generated park.
 */
export function screenCandidate(
  geom: SpanGeometry,
  pattern: PatternSummary,
  azimuthGainsDbi: readonly number[],
  need: AntennaNeed,
  model: SiteModel,
  opts: PlanOptions,
  chooser: CoaxChooser,
): Screened {
  const fp = footprintOf(geom);
  const t: LevelTally = { blocked: 0, review: 0 };
  tallyPowerLines(fp, model.powerLines, opts.clearance, t);
  t.review += countFallZoneOverlaps(fp, model.hazards);
  t.review += exposureReviews(geom, azimuthGainsDbi, need, model, opts);
  let coax: { lossDb: number | null; reaches: boolean } | null = null;
  const run = nearestRun(geom.feed, geom.feedHeightM, model.operatingPositions, opts.coaxRun);
  if (run) {
    const way = chooser.bestFor(run.runM);
    if (way) coax = { lossDb: wayLossDb(way, pattern.swr50), reaches: true };
    else {
      const m = chooser.types.length > 0 ? matchedLossDb(chooser.types[0], need.freqMhz, run.runM) : null;
      coax = { lossDb: m === null ? null : m + swrExtraLossDb(m, pattern.swr50), reaches: false };
    }
  }
  const { score } = scoreValue(need, pattern, coax, t.review);
  return { level: t.blocked > 0 ? 'blocked' : t.review > 0 ? 'needs-review' : 'clear', reviews: t.review, score };
}
