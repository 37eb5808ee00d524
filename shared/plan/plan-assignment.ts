import type { ClearanceLevel } from '../clearance/types';
import { type AssignOption, type AssignProblem, type AssignSolution, solveBruteForce, solveExact, solveHeuristic } from './assign';
import type { SpanGeometry } from './candidates';
import { allocateCoax } from './coax-allocation';
import type { Candidate } from './evaluate';
import { explainAntenna } from './explain';
import type { PlanOptions } from './options';
import type { AntennaPlan, ChosenSpot, ScreenedRow } from './plan-site';
import { type SeparatedAntenna, type SeparationResult, pairLevel, separationBetween } from './separation';
import type { AntennaNeed, SiteModel } from './site-model';

/** Score given up for each pair of chosen antennas whose separation needs review. */
export const SEPARATION_REVIEW_PENALTY = -0.05;

/**
 * Scores enter the assignment rounded to 0.001 (they are shown to 0.01): candidates that differ by less
 * are ties, which lets branch and bound prune them, and the total is the best possible to that step.
 */
export function assignmentScore(score: number): number {
  return Math.round(score * 1000) / 1000;
}

/** Rows best first; keeps the first inverted-V per support and every flat-top. */
function dominantRows<T extends { geom: SpanGeometry }>(rows: readonly T[]): T[] {
  const seen = new Set<string>();
  return rows.filter((r) => {
    if (r.geom.shape !== 'inverted-v') return true;
    const k = r.geom.supportIds[0];
    if (seen.has(k)) return false;
    seen.add(k);
    return true;
  });
}

/** An assignment option that carries its antenna, so pair checks need no lookup. */
type PlanOption = AssignOption & { antenna: SeparatedAntenna };

const VERDICT: Record<ClearanceLevel, { allowed: boolean; penalty: number }> = {
  clear: { allowed: true, penalty: 0 },
  'needs-review': { allowed: true, penalty: SEPARATION_REVIEW_PENALTY },
  blocked: { allowed: false, penalty: 0 },
};

/** Chooses one spot per antenna from the screened rows, gives out the coax and explains each choice. */
export function assignAntennas(args: {
  needs: readonly AntennaNeed[];
  rowsByNeed: readonly ScreenedRow[][];
  antennas: readonly AntennaPlan[];
  model: SiteModel;
  opts: PlanOptions;
  /** The full evaluation of a row (cached by the caller). */
  full: (needIndex: number, row: ScreenedRow) => Candidate;
}): { solution: AssignSolution; spots: ChosenSpot[]; separations: SeparationResult[] } {
  const { needs, model, opts } = args;
  const maxEnds = new Map(model.supports.map((s) => [s.id, s.maxEnds]));
  const rowById = new Map<string, { i: number; row: ScreenedRow }>();
  const antennaOf = new Map<string, SeparatedAntenna>();
  const problem: AssignProblem = {
    needs: needs.map((need, i) => ({
      key: need.key,
      priority: need.wavelengthM,
      // An inverted-V's leg directions share its feed point and support, so they meet every other antenna
      // alike (separation depends only on feed points and bands): the best-scoring direction dominates.
      options: ((rows) => (opts.keepAllLegDirections ? rows : dominantRows(rows)))(args.rowsByNeed[i].filter((r) => r.s.level !== 'blocked'))
        .map((row) => {
          const id = `${need.key}#${row.geom.id}`;
          rowById.set(id, { i, row });
          const antenna: SeparatedAntenna = {
            needKey: need.key,
            band: row.geom.band,
            freqMhz: need.freqMhz,
            feed: row.geom.feed,
            wireAzimuthDeg: row.geom.wireAzimuthDeg,
            azimuthGainsDbi: row.az,
          };
          antennaOf.set(id, antenna);
          return { id, needKey: need.key, score: assignmentScore(row.s.score), supportIds: row.geom.supportIds, antenna } satisfies PlanOption;
        }),
    })),
    maxEnds: (id) => maxEnds.get(id) ?? 1,
    pair: () => ({ allowed: true, penalty: 0 }),
  };
  const sepCache = new Map<string, SeparationResult>();
  const separation = (a: AssignOption, b: AssignOption): SeparationResult => {
    const key = a.id < b.id ? `${a.id}|${b.id}` : `${b.id}|${a.id}`;
    let r = sepCache.get(key);
    if (!r) {
      const [x, y] = a.id < b.id ? [a, b] : [b, a];
      r = separationBetween(antennaOf.get(x.id)!, antennaOf.get(y.id)!, opts.minSeparationWavelengths, opts.reviewSeparationWavelengths);
      sepCache.set(key, r);
    }
    return r;
  };
  problem.pair = (a, b) =>
    VERDICT[pairLevel((a as PlanOption).antenna, (b as PlanOption).antenna, opts.minSeparationWavelengths, opts.reviewSeparationWavelengths)];
  const method = opts.assignMethod === 'auto' ? (needs.length <= opts.exactUpToAntennas ? 'exact' : 'heuristic') : opts.assignMethod;
  const solution =
    method === 'exact' ? solveExact(problem, opts.maxSearchNodes) : method === 'heuristic' ? solveHeuristic(problem) : solveBruteForce(problem);
  const chosen = solution.choice.map((o) => {
    if (!o) return null;
    const { i, row } = rowById.get(o.id)!;
    return args.full(i, row);
  });
  const coax = allocateCoax(chosen, model.coax, needs);
  const spots: ChosenSpot[] = needs.map((need, i) => ({
    needKey: need.key,
    stationId: need.stationId,
    band: need.band,
    candidate: chosen[i],
    coaxPieceIds: coax[i].pieceIds,
    coaxNote: coax[i].note,
    limitedBy: explainAntenna(i, problem, solution, args.antennas[i], separation, maxEnds),
  }));
  const separations: SeparationResult[] = [];
  for (let i = 0; i < solution.choice.length; i++) {
    for (let j = i + 1; j < solution.choice.length; j++) {
      const a = solution.choice[i];
      const b = solution.choice[j];
      if (a && b) separations.push(separation(a, b));
    }
  }
  return { solution, spots, separations };
}
