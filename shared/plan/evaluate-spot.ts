import type { BandName } from '../bands';
import { makeCoaxChooser } from '../coax/coax-run';
import { type SiteFile } from '../schemas/site-file';
import { bandSpec, flatTopBetween, foldBearingDeg, invertedVsAt } from './candidates';
import { type Candidate, evaluateCandidate } from './evaluate';
import { type PlanOptionsInput, resolvePlanOptions } from './options';
import { type DipoleInput, freeSpaceAzimuthGainsDbi, patternSummary } from './physics';
import { buildSiteModel } from './site-model';

/** One antenna spot as the lead chose it (an antennaSpots record, or a candidate opened from the list). */
export type SpotToEvaluate = {
  stationId: string;
  band: BandName;
  shape: 'flat' | 'inverted-v';
  supportIds: readonly string[];
  /**
   * An inverted-V's leg bearing, degrees true (folded into [0, 180)): the wire is evaluated at exactly this
   * bearing, whether or not it is one of the options' directions. Null or absent: the candidate id below,
   * else the best-ranked direction. Ignored for a flat-top (its supports fix the bearing).
   */
  legAzimuthDeg?: number | null;
  /** A candidate id from planSite (picks the inverted-V leg direction); without it the best-ranked direction. */
  geometryId?: string;
};

export type EvaluatedSpot = {
  candidate: Candidate;
  /** What the pattern model was asked, for the elevation/azimuth pictures and the feed sweep. */
  patternInput: DipoleInput;
};

/**
 * The full checks of ONE spot, whether or not it is among the top-ranked candidates: what the safety review
 * (app and server alike) judges a recorded spot by. Null when the spot cannot be built any more (a support
 * is gone or has no height, the span no longer fits the wire), which the review treats as "cannot be cleared".
 * Inverted-V leg direction: the given bearing, else the given candidate id, else the same order planSite
 * ranks by (usable first, best score, then id), so every device picks the same one.
 */
export function evaluateSpot(site: SiteFile, spot: SpotToEvaluate, options: PlanOptionsInput = {}): EvaluatedSpot | null {
  const opts = resolvePlanOptions(options);
  const model = buildSiteModel(site);
  const need = model.needs.find((n) => n.stationId === spot.stationId && n.band === spot.band);
  if (!need) return null;
  const supports = spot.supportIds.map((id) => model.supports.find((s) => s.id === id));
  if (supports.some((s) => !s)) return null;
  const spec = bandSpec(spot.band, need.freqMhz, opts);
  const pinned = spot.shape === 'inverted-v' && typeof spot.legAzimuthDeg === 'number' && Number.isFinite(spot.legAzimuthDeg) ? foldBearingDeg(spot.legAzimuthDeg) : null;
  const geoms =
    spot.shape === 'flat'
      ? supports.length === 2
        ? [flatTopBetween(supports[0]!, supports[1]!, spec, model.ground, opts)].filter((g) => g !== null)
        : []
      : supports.length === 1
        ? invertedVsAt(supports[0]!, spec, model.ground, opts, pinned === null ? undefined : [pinned])
        : [];
  const chosen = spot.geometryId && pinned === null ? geoms.filter((g) => g.id === spot.geometryId) : geoms;
  if (chosen.length === 0) return null;
  const chooser = makeCoaxChooser(model.coax, need.freqMhz);
  const rows = chosen.map((geom) => {
    const { ground: _g, ...rest } = geom.patternInput;
    const az = freeSpaceAzimuthGainsDbi({ ...rest, heightM: 10, endHeightsM: undefined });
    return { geom, candidate: evaluateCandidate(geom, patternSummary(geom.patternInput), az, need, model, opts, chooser) };
  });
  rows.sort(
    (a, b) =>
      Number(a.candidate.level === 'blocked') - Number(b.candidate.level === 'blocked') ||
      b.candidate.score - a.candidate.score ||
      (a.geom.id < b.geom.id ? -1 : 1),
  );
  return { candidate: rows[0].candidate, patternInput: rows[0].geom.patternInput };
}
