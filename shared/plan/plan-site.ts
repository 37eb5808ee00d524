import { CAUTION_LINES, SAFETY_CAUTION } from '../clearance/cautions';
import type { Ground } from '../ground';
import type { SiteFile } from '../schemas/site-file';
import type { AssignSolution } from './assign';
import { type BandSpec, type SpanGeometry, allPairs, bandSpec, flatTopBetween, invertedVsAt, nearbyPairs } from './candidates';
import { type Candidate, evaluateCandidate, footprintOf } from './evaluate';
import { type Screened, screenCandidate } from './screen';
import { makeCoaxChooser } from '../coax/coax-run';
import { countBlockingLines } from '../clearance/power-line';
import { assignAntennas } from './plan-assignment';
import { type PlanOptionsInput, resolvePlanOptions } from './options';
import { type PatternSummary, freeSpaceAzimuthGainsDbi, patternSummary } from './physics';
import type { SeparationResult } from './separation';
import { type AntennaNeed, buildSiteModel } from './site-model';

/** In free space the height only places the wire; the cut is taken at one fixed height so it is shared. */
const FREE_SPACE_CUT_HEIGHT_M = 10;

const azimuthKey = (g: { band: string; shape: string; apexDeg: number | null }) => `${g.band}|${g.shape}|${g.apexDeg ?? ''}`;

/** One candidate geometry for one antenna, screened: what the ranking and the assignment work from. */
export type ScreenedRow = { geom: SpanGeometry; pattern: PatternSummary; az: number[]; s: Screened };

export type PlanSiteOptions = PlanOptionsInput & {
  /** Only this station's antennas (the assignment then places only them). */
  stationId?: string;
};

/** The ranked candidates for one antenna (a station on one band). */
export type AntennaPlan = {
  need: AntennaNeed;
  candidateCount: number;
  usableCount: number;
  blockedCount: number;
  /** Which rules blocked how many candidates, most first. */
  blockedBy: { key: string; count: number }[];
  /** Best first; blocked candidates only when nothing usable is left to show. */
  ranked: Candidate[];
};

export type ChosenSpot = {
  needKey: string;
  stationId: string;
  band: AntennaNeed['band'];
  candidate: Candidate | null;
  /** Pieces of the club's coax given to this antenna (each piece goes to one antenna). */
  coaxPieceIds: string[];
  coaxNote: string;
  /** Plain lines: what limited the choice for this antenna. */
  limitedBy: string[];
};

export type PlanResult = {
  formatVersion: 1;
  caution: string;
  cautions: readonly string[];
  ground: { label: string; ground: Ground };
  antennas: AntennaPlan[];
  assignment: {
    method: AssignSolution['method'];
    exact: boolean;
    totalScore: number;
    searchNodes: number;
    spots: ChosenSpot[];
    /** Separation between every two chosen antennas. */
    separations: SeparationResult[];
  };
  stats: {
    supports: number;
    antennas: number;
    pairsConsidered: number;
    geometries: number;
    candidates: number;
    patternEvaluations: number;
    patternCacheHits: number;
    pruneAndCache: boolean;
  };
};

/** The best few, with an inverted-V's other leg directions folded into its best one when no better. */
function rankedRows<T extends { geom: SpanGeometry; s: Screened }>(rows: readonly T[], top: number): T[] {
  const seen = new Set<string>();
  const out: T[] = [];
  for (const c of rows) {
    const k = `${c.geom.shape}|${c.geom.supportIds.join('~')}|${c.s.level}`;
    if (seen.has(k)) continue;
    seen.add(k);
    out.push(c);
    if (out.length >= top) break;
  }
  return out;
}

/**
 * Propose and assign antenna spots for a validated site file. Pure and deterministic: the same file and
 * options give the same result, with no clock, randomness or I/O, so it can run in a Web Worker.
 * Throws PlanInputError (with the field) for a file that is valid JSON but cannot be planned.
 */
export function planSite(site: SiteFile, options: PlanSiteOptions = {}): PlanResult {
  const opts = resolvePlanOptions(options);
  const model = buildSiteModel(site);
  const needs = options.stationId ? model.needs.filter((n) => n.stationId === options.stationId) : model.needs;
  if (options.stationId && needs.length === 0) throw new Error(`station "${options.stationId}" is not in the site file`);
  const cache = opts.pruneAndCache;
  const specs = new Map<string, BandSpec>();
  for (const n of needs) if (!specs.has(n.band)) specs.set(n.band, bandSpec(n.band, n.freqMhz, opts));
  const maxSpanM = Math.max(0, ...[...specs.values()].map((s) => s.maxSpanM));
  const pairs = cache ? nearbyPairs(model.supports, maxSpanM) : allPairs(model.supports.length);

  const geometryFor = (spec: BandSpec): SpanGeometry[] => {
    const out: SpanGeometry[] = [];
    for (const [i, j] of pairs) {
      const g = flatTopBetween(model.supports[i], model.supports[j], spec, model.ground, opts);
      if (g) out.push(g);
    }
    for (const s of model.supports) out.push(...invertedVsAt(s, spec, model.ground, opts));
    return out;
  };
  const geometryByBand = new Map<string, SpanGeometry[]>();
  const patterns = new Map<string, PatternSummary>();
  const azimuths = new Map<string, number[]>();
  let patternEvaluations = 0;
  let patternCacheHits = 0;
  let geometries = 0;
  const patternOf = (g: SpanGeometry): PatternSummary => {
    const hit = cache ? patterns.get(g.patternKey) : undefined;
    if (hit) {
      patternCacheHits++;
      return hit;
    }
    patternEvaluations++;
    const p = patternSummary(g.patternInput);
    if (cache) patterns.set(g.patternKey, p);
    return p;
  };
  const azimuthOf = (g: SpanGeometry): number[] => {
    const { ground: _ground, ...rest } = g.patternInput;
    const key = azimuthKey(g);
    const hit = cache ? azimuths.get(key) : undefined;
    if (hit) return hit;
    // Free space: the horizontal-plane shape of the wire alone, for gains toward people and other antennas.
    const gains = freeSpaceAzimuthGainsDbi({ ...rest, heightM: FREE_SPACE_CUT_HEIGHT_M, endHeightsM: undefined });
    azimuths.set(key, gains); // kept even without caching: the separation step reads the chosen antennas' cuts
    return gains;
  };

  const antennas: AntennaPlan[] = [];
  /** Per need: every geometry with its screened level and score, best usable first. */
  const screenedByNeed: ScreenedRow[][] = [];
  let candidateTotal = 0;
  const fullCache = new Map<string, Candidate>();
  const full = (i: number, x: ScreenedRow): Candidate => {
    const key = `${needs[i].key}#${x.geom.id}`;
    let c = fullCache.get(key);
    if (!c) {
      c = evaluateCandidate(x.geom, x.pattern, x.az, needs[i], model, opts, choosers[i]);
      fullCache.set(key, c);
    }
    return c;
  };
  const choosers = needs.map((n) => makeCoaxChooser(model.coax, n.freqMhz));
  needs.forEach((need, i) => {
    const spec = specs.get(need.band)!;
    let geoms = cache ? geometryByBand.get(need.band) : undefined;
    if (!geoms) {
      geoms = geometryFor(spec);
      geometries += geoms.length;
      if (cache) geometryByBand.set(need.band, geoms);
    }
    const rows = geoms.map((geom) => {
      const pattern = patternOf(geom);
      const az = azimuthOf(geom);
      return { geom, pattern, az, s: screenCandidate(geom, pattern, az, need, model, opts, choosers[i]) };
    });
    rows.sort(
      (a, b) =>
        Number(a.s.level === 'blocked') - Number(b.s.level === 'blocked') || b.s.score - a.s.score || (a.geom.id < b.geom.id ? -1 : 1),
    );
    candidateTotal += rows.length;
    const blockedRows = rows.filter((r) => r.s.level === 'blocked');
    const usable = rows.length - blockedRows.length;
    // Only power-line rules block; count which lines block how many candidates.
    const blockedBy = new Map<string, number>();
    for (const r of blockedRows) countBlockingLines(footprintOf(r.geom), model.powerLines, opts.clearance, blockedBy);
    const shown = rankedRows(usable > 0 ? rows.slice(0, usable) : rows, opts.topPerAntenna).map((r) => full(i, r));
    antennas.push({
      need,
      candidateCount: rows.length,
      usableCount: usable,
      blockedCount: blockedRows.length,
      blockedBy: [...blockedBy].map(([key, count]) => ({ key, count })).sort((a, b) => b.count - a.count || (a.key < b.key ? -1 : 1)),
      ranked: shown,
    });
    screenedByNeed.push(rows);
  });

  const { solution, spots, separations } = assignAntennas({ needs, rowsByNeed: screenedByNeed, antennas, model, opts, full });
  return {
    formatVersion: 1,
    caution: SAFETY_CAUTION,
    cautions: CAUTION_LINES,
    ground: { label: model.groundLabel, ground: model.ground },
    antennas,
    assignment: {
      method: solution.method,
      exact: solution.exact,
      totalScore: solution.total,
      searchNodes: solution.nodes,
      spots,
      separations,
    },
    stats: {
      supports: model.supports.length,
      antennas: needs.length,
      pairsConsidered: pairs.length,
      geometries,
      candidates: candidateTotal,
      patternEvaluations,
      patternCacheHits,
      pruneAndCache: cache,
    },
  };
}
