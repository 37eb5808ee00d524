import { SAFETY_CAUTION } from './cautions';
import { pointShapeDistanceM } from './planar';
import {
  type AntennaFootprint,
  type Clearance,
  type ClearanceLevel,
  type ClearanceOptions,
  FT_TO_M,
  type FootprintSupport,
  type RecordedHazard,
  fmtM,
  levelForDistance,
} from './types';

/** NCVEC Technician pool T0B06: if the antenna falls, no part of it may come closer than 10 ft to the wires. */
export const T0B06_MIN_GAP_M = 10 * FT_TO_M;
export const T0B06_SOURCE = 'NCVEC Technician question pool 2022–2026, T0B06';
export const OSHA_TABLE_A_SOURCE = 'OSHA 29 CFR 1926.1408 Table A';

/** OSHA 1926.1408 Table A, minimum clearance by nominal voltage (kV, inclusive upper bound) in feet. */
export const OSHA_TABLE_A: readonly { upToKv: number; clearanceFt: number }[] = [
  { upToKv: 50, clearanceFt: 10 },
  { upToKv: 200, clearanceFt: 15 },
  { upToKv: 350, clearanceFt: 20 },
  { upToKv: 500, clearanceFt: 25 },
  { upToKv: 750, clearanceFt: 35 },
  { upToKv: 1000, clearanceFt: 45 },
];

/**
 * Table A distance in metres, or null above 1000 kV (the table leaves it to the utility).
 * A line without a recorded voltage is planned as a transmission line at the widest row.
 */
export function oshaTableAClearanceM(voltageKv: number | undefined): number | null {
  const kv = voltageKv ?? 1000;
  const row = OSHA_TABLE_A.find((r) => kv <= r.upToKv);
  return row ? row.clearanceFt * FT_TO_M : null;
}

/** How far a support and the antenna hung from it can reach when something falls. */
export function fallReachM(support: FootprintSupport, swingReachM: number): number {
  return Math.max(support.heightM, swingReachM);
}

function closest(fp: AntennaFootprint, line: RecordedHazard, reachOf: (s: FootprintSupport) => number) {
  let best: { support: FootprintSupport; distanceM: number; reachM: number } | null = null;
  for (const s of fp.supports) {
    const distanceM = pointShapeDistanceM(s.at, line.shape);
    const reachM = reachOf(s);
    if (!best || distanceM - reachM < best.distanceM - best.reachM) best = { support: s, distanceM, reachM };
  }
  return best;
}

function verdict(level: ClearanceLevel): string {
  if (level === 'blocked') return 'blocked: no one can approve this; move the antenna';
  if (level === 'needs-review') return 'needs review: inside the review margin';
  return 'meets the rule';
}

/**
 * T0B06 fall check against one power line. Distances are horizontal and assume the line can be at any
 * height (a sagging span, a line lower than recorded), so the recorded line height is not relied on.
 */
function fallCore(fp: AntennaFootprint, line: RecordedHazard, opts: ClearanceOptions) {
  const c = closest(fp, line, (s) => fallReachM(s, fp.swingReachM));
  if (!c) throw new Error('an antenna footprint needs at least one support');
  const requiredM = c.reachM + T0B06_MIN_GAP_M;
  return { c, requiredM, level: levelForDistance(c.distanceM, requiredM, opts.reviewMarginFraction) };
}

export function powerLineFallClearance(fp: AntennaFootprint, line: RecordedHazard, opts: ClearanceOptions): Clearance {
  const { c, requiredM, level } = fallCore(fp, line, opts);
  return {
    key: `power-line:${line.id}`,
    kind: 'power-line',
    level,
    distanceM: c.distanceM,
    requiredM,
    rule: 'fall reach of the support and of the wire swinging from its remaining end, plus 10 ft',
    source: T0B06_SOURCE,
    message:
      `Power line ${line.id} is ${fmtM(c.distanceM)} from ${c.support.kind} ${c.support.supportId}; a fall reaches ` +
      `${fmtM(c.reachM)} and the rule needs 10 ft more, ${fmtM(requiredM)} in all: ${verdict(level)}.` +
      (line.heightM === undefined ? ' Line height not recorded: not needed, the check assumes the line could be at any height.' : ''),
    caution: SAFETY_CAUTION,
  };
}

/** The mast-raising level and distances; a line without voltage is never better than needs-review. */
function mastRaisingCore(mast: FootprintSupport, line: RecordedHazard, opts: ClearanceOptions) {
  const distanceM = pointShapeDistanceM(mast.at, line.shape);
  const tableM = oshaTableAClearanceM(line.voltageKv);
  if (tableM === null) {
    const requiredM = mast.heightM + 45 * FT_TO_M;
    return { distanceM, tableM, requiredM, level: (distanceM < requiredM ? 'blocked' : 'needs-review') as ClearanceLevel };
  }
  const requiredM = mast.heightM + tableM;
  let level = levelForDistance(distanceM, requiredM, opts.reviewMarginFraction);
  // Without a voltage the row cannot be chosen; the widest row up to 1000 kV is used and a person confirms it.
  if (line.voltageKv === undefined && level === 'clear') level = 'needs-review';
  return { distanceM, tableM, requiredM, level };
}

/** OSHA Table A while raising a mast: the mast's height plus the table distance for the line's voltage. */
export function mastRaisingClearance(mast: FootprintSupport, line: RecordedHazard, opts: ClearanceOptions): Clearance {
  const { distanceM, tableM, requiredM, level } = mastRaisingCore(mast, line, opts);
  const base = {
    key: `mast-raising:${mast.supportId}:${line.id}`,
    kind: 'mast-raising' as const,
    level,
    distanceM,
    requiredM,
    rule: 'raising a mast: mast height plus the Table A distance for the line voltage',
    source: OSHA_TABLE_A_SOURCE,
    caution: SAFETY_CAUTION,
  };
  if (tableM === null) {
    return {
      ...base,
      message: `Power line ${line.id} is recorded above 1000 kV: Table A leaves the distance to the utility; ask them before raising mast ${mast.supportId}.`,
    };
  }
  const voltageText =
    line.voltageKv === undefined
      ? 'voltage not recorded, planned as a transmission line (45 ft row); confirm the voltage with the utility'
      : `${line.voltageKv} kV needs ${fmtM(tableM)}`;
  return {
    ...base,
    message:
      `Raising mast ${mast.supportId} (${fmtM(mast.heightM)}) ${fmtM(distanceM)} from power line ${line.id}: ` +
      `${voltageText}, ${fmtM(requiredM)} in all: ${verdict(level)}.`,
  };
}

/** Counts of results that are blocked or need review, for screening many candidates without messages. */
export type LevelTally = { blocked: number; review: number };

export function tallyLevel(t: LevelTally, level: ClearanceLevel): void {
  if (level === 'blocked') t.blocked++;
  else if (level === 'needs-review') t.review++;
}

/** The same levels powerLineClearances gives, counted without building the results. */
export function tallyPowerLines(fp: AntennaFootprint, hazards: readonly RecordedHazard[], opts: ClearanceOptions, t: LevelTally): void {
  for (const h of hazards) {
    if (h.kind !== 'power-line') continue;
    tallyLevel(t, fallCore(fp, h, opts).level);
    for (const s of fp.supports) if (s.kind === 'mast') tallyLevel(t, mastRaisingCore(s, h, opts).level);
  }
}

/** Adds one to counts[key] for each power-line result that blocks (keys as powerLineClearances gives them). */
export function countBlockingLines(fp: AntennaFootprint, hazards: readonly RecordedHazard[], opts: ClearanceOptions, counts: Map<string, number>): void {
  const bump = (k: string) => counts.set(k, (counts.get(k) ?? 0) + 1);
  for (const h of hazards) {
    if (h.kind !== 'power-line') continue;
    if (fallCore(fp, h, opts).level === 'blocked') bump(`power-line:${h.id}`);
    for (const s of fp.supports) if (s.kind === 'mast' && mastRaisingCore(s, h, opts).level === 'blocked') bump(`mast-raising:${s.supportId}:${h.id}`);
  }
}

/** Every power-line result for one antenna: the fall check per line, and mast raising per mast and line. */
export function powerLineClearances(
  fp: AntennaFootprint,
  hazards: readonly RecordedHazard[],
  opts: ClearanceOptions,
): Clearance[] {
  const out: Clearance[] = [];
  for (const h of hazards) {
    if (h.kind !== 'power-line') continue;
    out.push(powerLineFallClearance(fp, h, opts));
    for (const s of fp.supports) if (s.kind === 'mast') out.push(mastRaisingClearance(s, h, opts));
  }
  return out;
}
