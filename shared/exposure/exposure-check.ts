import { SAFETY_CAUTION } from '../clearance/cautions';
import { type PlanePoint, type PlaneShape, closestPointOnShape, pointSegmentDistanceM, segmentShapeDistanceM } from '../clearance/planar';
import type { Clearance } from '../clearance/types';
import { fmtM } from '../clearance/types';
import { MPE_SOURCE } from './mpe-limits';
import { type ExposureDistances, type ExposureInput, OET65_SOURCE, exposureDistances } from './oet65';

export type ExposureCheckInput = ExposureInput & {
  /** Where the radiating wire lies in plan. */
  wire: readonly [PlanePoint, PlanePoint][];
  /** Paths, roads and parking (where the public is). */
  publicAreas: readonly { id: string; kind: string; shape: PlaneShape }[];
  operatingPositions: readonly { id: string; at: PlanePoint }[];
  /** How the gain toward people was taken, for the message. */
  gainNote: string;
  /** The antenna centre, and the gain (dBi) toward a point; without it gainDbi is used in every direction. */
  centre?: PlanePoint;
  gainTowardDbi?: (toward: PlanePoint) => number;
};

export type ExposureResult = ExposureDistances & { gainDbi: number; gainNote: string; results: Clearance[] };

const SOURCE = `${MPE_SOURCE}; ${OET65_SOURCE}`;

function wireDistanceToShapeM(wire: ExposureCheckInput['wire'], shape: PlaneShape): number {
  let best = Infinity;
  for (const [a, b] of wire) best = Math.min(best, segmentShapeDistanceM(a, b, shape));
  return best;
}

function wireDistanceToPointM(wire: ExposureCheckInput['wire'], p: PlanePoint): number {
  let best = Infinity;
  for (const [a, b] of wire) best = Math.min(best, pointSegmentDistanceM(p, a, b));
  return best;
}

/** Each public area checked with the gain toward it; the one with the least margin. */
function worstPublicArea(input: ExposureCheckInput, peakUncontrolledM: number) {
  let worst: { id: string; kind: string; distanceM: number; requiredM: number; gainDbi: number } | null = null;
  for (const area of input.publicAreas) {
    const distanceM = wireDistanceToShapeM(input.wire, area.shape);
    const gainDbi =
      input.gainTowardDbi && input.centre ? input.gainTowardDbi(closestPointOnShape(input.centre, area.shape)) : input.gainDbi;
    // R grows as the square root of EIRP: 10^(ΔG/20) from the distance at peak gain.
    const requiredM = peakUncontrolledM * 10 ** ((gainDbi - input.gainDbi) / 20);
    if (!worst || distanceM - requiredM < worst.distanceM - worst.requiredM) worst = { id: area.id, kind: area.kind, distanceM, requiredM, gainDbi };
  }
  return worst;
}

function nearestOperator(input: ExposureCheckInput) {
  let op: { id: string; distanceM: number } | null = null;
  for (const p of input.operatingPositions) {
    const distanceM = wireDistanceToPointM(input.wire, p.at);
    if (!op || distanceM < op.distanceM) op = { id: p.id, distanceM };
  }
  return op;
}

/** How many of exposureCheck's results need review, without building them (for screening candidates). */
export function countExposureReviews(input: ExposureCheckInput, distances: ExposureDistances): number {
  const worst = worstPublicArea(input, distances.distanceM.uncontrolled);
  const op = nearestOperator(input);
  return (worst === null || worst.distanceM < worst.requiredM ? 1 : 0) + (op === null || op.distanceM < distances.distanceM.controlled ? 1 : 0);
}

/**
 * RF exposure for one antenna: the public (uncontrolled limit) must be outside the uncontrolled distance
 * from the wire, the operators (controlled limit) outside the controlled one. Horizontal distance from the
 * nearest point of the wire is used, which is never more than the true distance (conservative).
 */
export function exposureCheck(input: ExposureCheckInput): ExposureResult {
  const d = exposureDistances(input);
  const uM = d.distanceM.uncontrolled;
  const cM = d.distanceM.controlled;
  const basis =
    `${d.averagePowerW.toFixed(0)} W average (duty ${Math.round(input.dutyFactor * 100)} %), ${input.gainDbi.toFixed(1)} dBi ` +
    `${input.gainNote} at ${input.freqMhz.toFixed(2)} MHz`;
  const results: Clearance[] = [];
  const nearest = worstPublicArea(input, uM);
  const rule = 'the public stays outside the uncontrolled-exposure distance from the wire';
  if (!nearest) {
    results.push({
      key: 'rf-exposure:public',
      kind: 'rf-exposure',
      level: 'needs-review',
      distanceM: null,
      requiredM: uM,
      rule,
      source: SOURCE,
      message: `No path, road or parking is recorded, so where the public walks is unknown: keep them ${fmtM(uM)} from the wire (${basis}).`,
      caution: SAFETY_CAUTION,
    });
  } else {
    const inside = nearest.distanceM < nearest.requiredM;
    const toward =
      nearest.gainDbi === input.gainDbi ? '' : `; ${nearest.gainDbi.toFixed(1)} dBi toward it, ${fmtM(uM)} at peak gain`;
    results.push({
      key: 'rf-exposure:public',
      kind: 'rf-exposure',
      level: inside ? 'needs-review' : 'clear',
      distanceM: nearest.distanceM,
      requiredM: nearest.requiredM,
      rule,
      source: SOURCE,
      message: inside
        ? `${nearest.kind} ${nearest.id} is ${fmtM(nearest.distanceM)} from the wire, inside the public distance ${fmtM(nearest.requiredM)} (${basis}${toward}): rope off or reduce power.`
        : `The closest public area to its limit (${nearest.kind} ${nearest.id}) is ${fmtM(nearest.distanceM)} from the wire, outside the public distance ${fmtM(nearest.requiredM)} (${basis}${toward}).`,
      caution: SAFETY_CAUTION,
    });
  }
  const op = nearestOperator(input);
  if (op) {
    const inside = op.distanceM < cM;
    results.push({
      key: 'rf-exposure:operators',
      kind: 'rf-exposure',
      level: inside ? 'needs-review' : 'clear',
      distanceM: op.distanceM,
      requiredM: cM,
      rule: 'operators stay outside the controlled-exposure distance from the wire',
      source: SOURCE,
      message: inside
        ? `Operating position ${op.id} is ${fmtM(op.distanceM)} from the wire, inside the operators' distance ${fmtM(cM)} (${basis}).`
        : `Operating position ${op.id} is ${fmtM(op.distanceM)} from the wire, outside the operators' distance ${fmtM(cM)}.`,
      caution: SAFETY_CAUTION,
    });
  }
  if (!op) {
    results.push({
      key: 'rf-exposure:operators',
      kind: 'rf-exposure',
      level: 'needs-review',
      distanceM: null,
      requiredM: cM,
      rule: 'operators stay outside the controlled-exposure distance from the wire',
      source: SOURCE,
      message: `No operating position is recorded, so the operators' distance cannot be checked: keep them ${fmtM(cM)} from the wire.`,
      caution: SAFETY_CAUTION,
    });
  }
  return { ...d, gainDbi: input.gainDbi, gainNote: input.gainNote, results };
}
