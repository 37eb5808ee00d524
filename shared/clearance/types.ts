import type { PlanePoint, PlaneShape } from './planar';

export type ClearanceLevel = 'blocked' | 'needs-review' | 'clear';
export type ClearanceKind = 'power-line' | 'mast-raising' | 'public-area' | 'property' | 'rf-exposure' | 'station-separation';

/**
 * One checked rule for one antenna spot. `blocked` cannot be approved by anyone; `needs-review` goes to
 * the safety officer with the distance in `message`; `clear` means the recorded data meets the rule.
 * Distances are horizontal metres (null when the rule has no distance). `caution` is SAFETY_CAUTION.
 */
export type Clearance = {
  /** Stable key for review decisions, e.g. "power-line:L1". */
  key: string;
  kind: ClearanceKind;
  level: ClearanceLevel;
  distanceM: number | null;
  requiredM: number | null;
  rule: string;
  source: string;
  message: string;
  caution: string;
};

export type FootprintSupport = {
  supportId: string;
  kind: 'tree' | 'mast' | 'structure';
  at: PlanePoint;
  /** Overall height: what a fall of the support reaches. */
  heightM: number;
};

/** Where an antenna and its supports sit in plan, and how far its wire can reach if something lets go. */
export type AntennaFootprint = {
  supports: FootprintSupport[];
  /** The radiating wire in plan, as segments. */
  wire: [PlanePoint, PlanePoint][];
  /** Wire, insulators and ropes swinging down from a remaining attachment reach this far from it. */
  swingReachM: number;
};

export type RecordedHazard = {
  id: string;
  kind: 'power-line' | 'path' | 'road' | 'parking' | 'building' | 'water';
  shape: PlaneShape;
  heightM?: number;
  voltageKv?: number;
};

export type ClearanceOptions = {
  /** A result within requiredM × (1 + margin) is flagged for review. Default 0.5 (50 %). */
  reviewMarginFraction: number;
};

export const DEFAULT_CLEARANCE_OPTIONS: ClearanceOptions = { reviewMarginFraction: 0.5 };

const ORDER: Record<ClearanceLevel, number> = { clear: 0, 'needs-review': 1, blocked: 2 };

/** The most severe level among results (clear when there are none). */
export function worstLevel(results: readonly { level: ClearanceLevel }[]): ClearanceLevel {
  let worst: ClearanceLevel = 'clear';
  for (const r of results) if (ORDER[r.level] > ORDER[worst]) worst = r.level;
  return worst;
}

/** Level for "distance must be at least required": equal meets the rule; within the margin needs review. */
export function levelForDistance(distanceM: number, requiredM: number, marginFraction: number): ClearanceLevel {
  if (distanceM < requiredM) return 'blocked';
  if (distanceM < requiredM * (1 + marginFraction)) return 'needs-review';
  return 'clear';
}

export const FT_TO_M = 0.3048;

export function fmtM(m: number): string {
  return `${m.toFixed(1)} m (${(m / FT_TO_M).toFixed(0)} ft)`;
}
