import { planeBearingDeg } from '../clearance/planar';
import { powerLineClearances } from '../clearance/power-line';
import { publicAreaClearances } from '../clearance/public-area';
import { type AntennaFootprint, type Clearance, type ClearanceLevel, worstLevel } from '../clearance/types';
import { type CoaxChooser, type CoaxRun, planCoaxRun } from '../coax/coax-run';
import { MODE_DUTY_FACTOR } from '../exposure/duty';
import { type ExposureCheckInput, exposureCheck } from '../exposure/exposure-check';
import type { SpanGeometry } from './candidates';
import type { PlanOptions } from './options';
import type { PatternSummary } from './physics';
import { type Score, scoreCandidate } from './score';
import type { AntennaNeed, SiteModel } from './site-model';

/** A candidate spot for one antenna, with everything checked and the score that ranks it. JSON-safe. */
export type Candidate = Omit<SpanGeometry, 'patternInput' | 'patternKey'> & {
  needKey: string;
  stationId: string;
  pattern: PatternSummary;
  clearances: Clearance[];
  level: ClearanceLevel;
  exposure: { averagePowerW: number; controlledM: number; uncontrolledM: number; peakGainDbi: number };
  coax: CoaxRun | null;
} & Score;

/** Never trust a null toward people this close: at least isotropic (0 dBi) in every direction (Loftline's choice). */
export const EXPOSURE_GAIN_FLOOR_DBI = 0;

export function footprintOf(geom: SpanGeometry): AntennaFootprint {
  return { supports: geom.footprint, wire: geom.wire, swingReachM: geom.swingReachM };
}

/** What the exposure check is asked for one antenna spot: gains toward people from the free-space cut. */
export function exposureInputFor(
  geom: SpanGeometry,
  freeSpaceAzimuthGainsDbi: readonly number[],
  need: AntennaNeed,
  model: SiteModel,
  opts: PlanOptions,
): ExposureCheckInput {
  let peakGainDbi = -Infinity;
  for (const g of freeSpaceAzimuthGainsDbi) if (g > peakGainDbi) peakGainDbi = g;
  return {
    freqMhz: need.highMhz,
    powerW: need.powerW,
    dutyFactor: MODE_DUTY_FACTOR[need.mode],
    transmitFraction: opts.transmitFraction,
    gainDbi: peakGainDbi,
    gainNote: 'free-space peak (OET-65 adds the ground reflection)',
    wire: geom.wire,
    publicAreas: model.publicAreas,
    operatingPositions: model.operatingPositions,
    centre: geom.feed,
    gainTowardDbi: (p) => {
      // The bearing toward p from the centre, as the pattern's azimuth (0° = along the wire toward end 1).
      const rel = Math.round(planeBearingDeg(geom.feed, p) - geom.wireAzimuthDeg);
      return Math.max(EXPOSURE_GAIN_FLOOR_DBI, freeSpaceAzimuthGainsDbi[((rel % 360) + 360) % 360]);
    },
  };
}

export function evaluateCandidate(
  geom: SpanGeometry,
  pattern: PatternSummary,
  /** Free-space gain in the horizontal plane by degrees from the wire axis (index 0…359). */
  freeSpaceAzimuthGainsDbi: readonly number[],
  need: AntennaNeed,
  model: SiteModel,
  opts: PlanOptions,
  chooser?: CoaxChooser,
): Candidate {
  const fp = footprintOf(geom);
  const exposure = exposureCheck(exposureInputFor(geom, freeSpaceAzimuthGainsDbi, need, model, opts));
  const clearances = [
    ...powerLineClearances(fp, model.powerLines, opts.clearance),
    ...publicAreaClearances(fp, model.hazards),
    ...exposure.results,
  ];
  const coax = planCoaxRun({
    feedAt: geom.feed,
    feedHeightM: geom.feedHeightM,
    freqMhz: need.freqMhz,
    swr: pattern.swr50,
    operatingPositions: model.operatingPositions,
    inventory: model.coax,
    options: opts.coaxRun,
    chooser,
  });
  const score = scoreCandidate({ need, pattern, feedHeightM: geom.feedHeightM, coax, clearances });
  const { patternInput: _input, patternKey: _key, ...geometry } = geom;
  return {
    ...geometry,
    needKey: need.key,
    stationId: need.stationId,
    pattern,
    clearances,
    level: worstLevel(clearances),
    exposure: {
      averagePowerW: exposure.averagePowerW,
      controlledM: exposure.distanceM.controlled,
      uncontrolledM: exposure.distanceM.uncontrolled,
      peakGainDbi: exposure.gainDbi,
    },
    coax,
    ...score,
  };
}
