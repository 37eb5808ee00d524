import type { BandName } from '../bands';
import { type PlanePoint, planeBearingDeg, planeDistanceM } from '../clearance/planar';
import type { FootprintSupport } from '../clearance/types';
import type { Ground } from '../ground';
import type { PlanOptions } from './options';
import { type DipoleInput, dipoleCutLengthM, sagSpan, wavelengthAtM } from './physics';
import type { ModelSupport } from './site-model';

/** Where one dipole for one band could hang: geometry only, before any station-specific check. */
export type SpanGeometry = {
  id: string;
  band: BandName;
  shape: 'flat' | 'inverted-v';
  supportIds: string[];
  feed: PlanePoint;
  feedHeightM: number;
  heightWavelengths: number;
  wireLengthM: number;
  /** Flat-top: distance between the supports, mid-span sag and rope at each end. */
  spanM: number | null;
  sagM: number | null;
  ropeEachEndM: number | null;
  /** Heights of the two wire ends (at the end insulators). */
  endHeightsM: [number, number];
  apexDeg: number | null;
  /** Compass direction of the wire, 0–180°, and the two broadside bearings. */
  wireAzimuthDeg: number;
  broadsideDeg: [number, number];
  wire: [PlanePoint, PlanePoint][];
  footprint: FootprintSupport[];
  swingReachM: number;
  /** What the pattern model is asked (heights rounded to the cache bucket). */
  patternInput: DipoleInput;
  patternKey: string;
};

export type BandSpec = { band: BandName; freqMhz: number; wavelengthM: number; wireLengthM: number; minSpanM: number; maxSpanM: number };

export function bandSpec(band: BandName, freqMhz: number, opts: PlanOptions): BandSpec {
  const wireLengthM = dipoleCutLengthM(freqMhz);
  const fixed = wireLengthM + 2 * opts.insulatorM;
  return {
    band,
    freqMhz,
    wavelengthM: wavelengthAtM(freqMhz),
    wireLengthM,
    minSpanM: fixed + 2 * opts.minRopeM,
    maxSpanM: fixed + 2 * opts.maxRopeM,
  };
}

function bucket(heightM: number, spec: BandSpec, opts: PlanOptions): number {
  const step = spec.wavelengthM * opts.heightBucketWavelengths;
  return Math.max(step, Math.round(heightM / step) * step);
}

function lerp(a: PlanePoint, b: PlanePoint, t: number): PlanePoint {
  return { eastM: a.eastM + (b.eastM - a.eastM) * t, northM: a.northM + (b.northM - a.northM) * t };
}

function broadside(azDeg: number): [number, number] {
  const a = (azDeg + 90) % 360;
  const b = (azDeg + 270) % 360;
  return a < b ? [a, b] : [b, a];
}

function footprintOf(s: ModelSupport): FootprintSupport {
  return { supportId: s.id, kind: s.kind, at: s.at, heightM: s.heightM };
}

const round3 = (x: number) => Math.round(x * 1000) / 1000;

/**
 * A flat-top dipole between supports a and b, or null when the span cannot carry it: too short for the wire,
 * insulators and the minimum rope at each end; too long for the maximum rope; or any part of the sagged
 * wire lower than the minimum wire height. Ropes are equal, so the feed point is at mid-span.
 */
export function flatTopBetween(a: ModelSupport, b: ModelSupport, spec: BandSpec, ground: Ground, opts: PlanOptions): SpanGeometry | null {
  const spanM = planeDistanceM(a.at, b.at);
  if (spanM < spec.minSpanM || spanM > spec.maxSpanM) return null;
  const ropeEachEndM = (spanM - spec.wireLengthM - 2 * opts.insulatorM) / 2;
  const ha = a.attachHeightM;
  const hb = b.attachHeightM;
  // Feed height, sag and lowest point from the wire model; the whole span (ropes too) hangs from the supports.
  const span = sagSpan(spanM, [ha, hb], opts.spanTensionN, opts.feedLoadN, opts.minWireHeightM);
  if (span.lowestM !== null && span.lowestM < opts.minWireHeightM) return null;
  const sagM = span.sagM;
  const feedHeightM = span.feedHeightM;
  const t1 = ropeEachEndM / spanM;
  const t2 = 1 - t1;
  // Heights of the wire ends, for the pattern model only (bucketed): chord less the parabolic share of the sag.
  const endAt = (t: number) => ha + (hb - ha) * t - 4 * sagM * t * (1 - t);
  const endHeightsM: [number, number] = [endAt(t1), endAt(t2)];
  const wireAzimuthDeg = planeBearingDeg(a.at, b.at) % 180;
  const hb0 = bucket(feedHeightM, spec, opts);
  const eb = Math.max(hb0, bucket((endHeightsM[0] + endHeightsM[1]) / 2, spec, opts));
  const patternInput: DipoleInput = {
    freqMhz: spec.freqMhz,
    ground,
    shape: 'flat',
    heightM: hb0,
    lengthM: spec.wireLengthM,
    endHeightsM: [eb, eb],
  };
  return {
    id: `${spec.band}:flat:${a.id}~${b.id}`,
    band: spec.band,
    shape: 'flat',
    supportIds: [a.id, b.id],
    feed: lerp(a.at, b.at, 0.5),
    feedHeightM,
    heightWavelengths: feedHeightM / spec.wavelengthM,
    wireLengthM: spec.wireLengthM,
    spanM,
    sagM,
    ropeEachEndM,
    endHeightsM,
    apexDeg: null,
    wireAzimuthDeg,
    broadsideDeg: broadside(wireAzimuthDeg),
    wire: [[lerp(a.at, b.at, t1), lerp(a.at, b.at, t2)]],
    footprint: [footprintOf(a), footprintOf(b)],
    // If one end lets go, wire, insulators and both ropes swing from the other support: the whole span.
    swingReachM: spanM,
    patternInput,
    patternKey: `${spec.band}|flat|${round3(hb0)}|${round3(eb)}`,
  };
}

/**
 * How far out from the foot of the support each leg end of an inverted-V lies, horizontally: the leg is the
 * hypotenuse and apex/2 the angle it makes with the vertical, so the offset is leg·sin(apex/2) (plain
 * right-triangle trigonometry; the drop below the apex is leg·cos(apex/2)).
 */
export function legEndOffsetM(legM: number, apexDeg: number): number {
  return legM * Math.sin(((apexDeg / 2) * Math.PI) / 180);
}

/** A leg bearing folded into [0, 180): a wire laid along 210° is the same wire as one along 30°. */
export function foldBearingDeg(azDeg: number): number {
  return ((azDeg % 180) + 180) % 180;
}

/**
 * Inverted-V dipoles with the apex at support s, one per leg direction (the options' directions unless
 * `azimuthsDeg` names others, such as the bearing a lead chose); none when the ends would be too low.
 */
export function invertedVsAt(
  s: ModelSupport,
  spec: BandSpec,
  ground: Ground,
  opts: PlanOptions,
  azimuthsDeg: readonly number[] = opts.invertedVAzimuthsDeg,
): SpanGeometry[] {
  const legM = spec.wireLengthM / 2;
  const half = (opts.invertedVApexDeg / 2) * (Math.PI / 180);
  const endHeightM = s.attachHeightM - legM * Math.cos(half);
  if (endHeightM < opts.minWireHeightM) return [];
  const reachM = legEndOffsetM(legM, opts.invertedVApexDeg);
  const apexB = bucket(s.attachHeightM, spec, opts);
  const patternInput: DipoleInput = {
    freqMhz: spec.freqMhz,
    ground,
    shape: 'inverted-v',
    heightM: apexB,
    lengthM: spec.wireLengthM,
    apexDeg: opts.invertedVApexDeg,
  };
  return azimuthsDeg.map((azDeg) => {
    const az = (azDeg * Math.PI) / 180;
    const dx = Math.sin(az) * reachM;
    const dy = Math.cos(az) * reachM;
    const e1 = { eastM: s.at.eastM - dx, northM: s.at.northM - dy };
    const e2 = { eastM: s.at.eastM + dx, northM: s.at.northM + dy };
    return {
      id: `${spec.band}:iv:${s.id}@${azDeg}`,
      band: spec.band,
      shape: 'inverted-v' as const,
      supportIds: [s.id],
      feed: s.at,
      feedHeightM: s.attachHeightM,
      heightWavelengths: s.attachHeightM / spec.wavelengthM,
      wireLengthM: spec.wireLengthM,
      spanM: null,
      sagM: null,
      ropeEachEndM: null,
      endHeightsM: [endHeightM, endHeightM] as [number, number],
      apexDeg: opts.invertedVApexDeg,
      wireAzimuthDeg: foldBearingDeg(azDeg),
      broadsideDeg: broadside(foldBearingDeg(azDeg)),
      wire: [
        [e1, s.at],
        [s.at, e2],
      ] as [PlanePoint, PlanePoint][],
      footprint: [footprintOf(s)],
      // A leg let go swings from the apex; the whole wire dropped lies within a leg of the support.
      swingReachM: legM + opts.insulatorM,
      patternInput,
      patternKey: `${spec.band}|iv|${round3(apexB)}|${opts.invertedVApexDeg}`,
    };
  });
}

/**
 * Every support pair within reach of each other, found with a uniform grid of cell size maxSpanM so that
 * pairs farther apart than the longest usable span are never looked at. Pairs come out in a fixed order.
 */
export function nearbyPairs(supports: readonly ModelSupport[], maxSpanM: number): [number, number][] {
  const cell = Math.max(maxSpanM, 1);
  const grid = new Map<string, number[]>();
  const keyOf = (i: number) => {
    const p = supports[i].at;
    return [Math.floor(p.eastM / cell), Math.floor(p.northM / cell)] as const;
  };
  supports.forEach((_, i) => {
    const [cx, cy] = keyOf(i);
    const k = `${cx},${cy}`;
    const list = grid.get(k);
    if (list) list.push(i);
    else grid.set(k, [i]);
  });
  const out: [number, number][] = [];
  supports.forEach((s, i) => {
    const [cx, cy] = keyOf(i);
    for (let dx = -1; dx <= 1; dx++) {
      for (let dy = -1; dy <= 1; dy++) {
        for (const j of grid.get(`${cx + dx},${cy + dy}`) ?? []) {
          if (j > i && planeDistanceM(s.at, supports[j].at) <= maxSpanM) out.push([i, j]);
        }
      }
    }
  });
  return out.sort((p, q) => p[0] - q[0] || p[1] - q[1]);
}

/** Every pair, no pruning: the straightforward reference the benchmark compares against. */
export function allPairs(n: number): [number, number][] {
  const out: [number, number][] = [];
  for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) out.push([i, j]);
  return out;
}
