import { type ClearanceOptions, DEFAULT_CLEARANCE_OPTIONS } from '../clearance/types';
import { type CoaxRunOptions, DEFAULT_COAX_RUN_OPTIONS } from '../coax/coax-run';

/**
 * Everything the planner assumes that is not in the site file. Defaults are common practice for field-day
 * wire antennas (hand-tensioned ropes, dogbone insulators) and are documented in README "How Loftline
 * proposes and checks antenna spots".
 */
export type PlanOptions = {
  clearance: ClearanceOptions;
  coaxRun: CoaxRunOptions;
  /** Length of one end insulator. */
  insulatorM: number;
  /** Shortest rope between an end insulator and its support (keeps the high-voltage wire end off the tree). */
  minRopeM: number;
  /** Longest rope per end that still holds a span up without a long droop. */
  maxRopeM: number;
  /** Horizontal tension the crew puts on a span. */
  spanTensionN: number;
  /** Weight hanging at the feed point: centre insulator and the coax drop. */
  feedLoadN: number;
  /** Wire ends and the feed point stay at least this high (wire ends carry high RF voltage). */
  minWireHeightM: number;
  /** Included angle between inverted-V legs. */
  invertedVApexDeg: number;
  /** Directions (compass, 0–180°) tried for an inverted-V's legs. */
  invertedVAzimuthsDeg: number[];
  /** Antennas of two stations closer than this many wavelengths of the lower band are not used together. */
  minSeparationWavelengths: number;
  /** Closer than this (wavelengths of the lower band) a harmonic-related or side-by-side pair is reviewed. */
  reviewSeparationWavelengths: number;
  /** Fraction of each averaging period a station transmits (1 = the worst case, used by default). */
  transmitFraction: number;
  /** Heights handed to the pattern model are rounded to this fraction of a wavelength (cache buckets). */
  heightBucketWavelengths: number;
  /** Ranked candidates kept per antenna in the result (the assignment sees all of them). */
  topPerAntenna: number;
  /** Search nodes the exact assignment may visit before it settles for the best found. */
  maxSearchNodes: number;
  /** Up to this many antennas the assignment is exact (branch and bound); beyond, a heuristic. */
  exactUpToAntennas: number;
  /** 'auto': exact up to exactUpToAntennas, heuristic beyond; the others force one method (tests, studies). */
  assignMethod: 'auto' | 'exact' | 'heuristic' | 'brute-force';
  /** Offer every inverted-V leg direction to the assignment (normally only the best per support: see plan-assignment.ts). */
  keepAllLegDirections: boolean;
  /** Skip support pairs farther apart than the longest usable span (a spatial grid) and cache patterns. */
  pruneAndCache: boolean;
};

export const DEFAULT_PLAN_OPTIONS: PlanOptions = {
  clearance: DEFAULT_CLEARANCE_OPTIONS,
  coaxRun: DEFAULT_COAX_RUN_OPTIONS,
  insulatorM: 0.1,
  minRopeM: 1,
  maxRopeM: 15,
  spanTensionN: 100,
  feedLoadN: 10,
  minWireHeightM: 3,
  invertedVApexDeg: 120,
  invertedVAzimuthsDeg: [0, 45, 90, 135],
  minSeparationWavelengths: 0.5,
  reviewSeparationWavelengths: 1,
  transmitFraction: 1,
  heightBucketWavelengths: 0.02,
  topPerAntenna: 10,
  maxSearchNodes: 2_000_000,
  exactUpToAntennas: 8,
  assignMethod: 'auto',
  keepAllLegDirections: false,
  pruneAndCache: true,
};

export type PlanOptionsInput = Partial<Omit<PlanOptions, 'clearance' | 'coaxRun'>> & {
  clearance?: Partial<ClearanceOptions>;
  coaxRun?: Partial<CoaxRunOptions>;
};

export function resolvePlanOptions(input: PlanOptionsInput = {}): PlanOptions {
  return {
    ...DEFAULT_PLAN_OPTIONS,
    ...input,
    clearance: { ...DEFAULT_PLAN_OPTIONS.clearance, ...input.clearance },
    coaxRun: { ...DEFAULT_PLAN_OPTIONS.coaxRun, ...input.coaxRun },
  };
}
