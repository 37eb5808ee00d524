/*
 * Choosing one spot per antenna: maximise the total score with no support carrying more ends than it can
 * and no two antennas breaking the separation rule. An antenna left without a spot costs UNASSIGNED_SCORE,
 * far below any spot's score, so the plan places as many antennas as it can before it maximises quality.
 * Exact (branch and bound) up to a few antennas; greedy plus local improvement beyond.
 */
export type AssignOption = { id: string; needKey: string; score: number; supportIds: readonly string[] };
export type PairVerdict = { allowed: boolean; penalty: number };
export type AssignProblem = {
  /** Needs with a higher priority are decided first (the planner puts the longest wavelengths first). */
  needs: { key: string; options: AssignOption[]; priority?: number }[];
  maxEnds: (supportId: string) => number;
  /** Whether two options of different antennas may be used together, and the score penalty (≤ 0) if so. */
  pair: (a: AssignOption, b: AssignOption) => PairVerdict;
};
export type AssignMethod = 'branch-and-bound' | 'greedy-local' | 'brute-force';
export type AssignSolution = {
  /** One option (or null) per need, in the problem's order. */
  choice: (AssignOption | null)[];
  total: number;
  /** True when the method proves the total is the highest possible. */
  exact: boolean;
  method: AssignMethod;
  nodes: number;
};

export const UNASSIGNED_SCORE = -10;
const EPS = 1e-9;

function byScore(a: AssignOption, b: AssignOption): number {
  return b.score - a.score || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0);
}

class State {
  readonly used = new Map<string, number>();
  constructor(private readonly problem: AssignProblem) {}
  fits(o: AssignOption): boolean {
    for (const s of o.supportIds) if ((this.used.get(s) ?? 0) + 1 > this.problem.maxEnds(s)) return false;
    return true;
  }
  add(o: AssignOption, sign: 1 | -1): void {
    for (const s of o.supportIds) this.used.set(s, (this.used.get(s) ?? 0) + sign);
  }
  /** Sum of pair penalties against the chosen options, or null when one pair is not allowed. */
  pairPenalty(o: AssignOption, chosen: readonly (AssignOption | null)[], skip = -1): number | null {
    let penalty = 0;
    for (let j = 0; j < chosen.length; j++) {
      const c = chosen[j];
      if (!c || j === skip) continue;
      const v = this.problem.pair(c, o);
      if (!v.allowed) return null;
      penalty += v.penalty;
    }
    return penalty;
  }
}

/** Total score of a full choice (null when it breaks a rule). */
export function totalOf(problem: AssignProblem, choice: readonly (AssignOption | null)[]): number | null {
  const state = new State(problem);
  let total = 0;
  const placed: (AssignOption | null)[] = [];
  for (const o of choice) {
    if (!o) {
      total += UNASSIGNED_SCORE;
      placed.push(null);
      continue;
    }
    if (!state.fits(o)) return null;
    const p = state.pairPenalty(o, placed);
    if (p === null) return null;
    state.add(o, 1);
    total += o.score + p;
    placed.push(o);
  }
  return total;
}

function greedy(problem: AssignProblem): (AssignOption | null)[] {
  const n = problem.needs.length;
  const order = [...problem.needs.keys()].sort(
    (a, b) => (problem.needs[b].options[0]?.score ?? -Infinity) - (problem.needs[a].options[0]?.score ?? -Infinity) || a - b,
  );
  const state = new State(problem);
  const choice: (AssignOption | null)[] = new Array(n).fill(null);
  for (const i of order) {
    for (const o of problem.needs[i].options) {
      if (state.fits(o) && state.pairPenalty(o, choice) !== null) {
        choice[i] = o;
        state.add(o, 1);
        break;
      }
    }
  }
  return choice;
}

/** Greedy start, then move single antennas to better spots until no single move improves the total. */
export function solveHeuristic(problem: AssignProblem, maxRounds = 4): AssignSolution {
  const choice = greedy(problem);
  let total = totalOf(problem, choice) ?? -Infinity;
  let nodes = 0;
  for (let round = 0; round < maxRounds; round++) {
    let improved = false;
    for (let i = 0; i < choice.length; i++) {
      const current = choice[i];
      for (const o of problem.needs[i].options) {
        if (o === current) break; // options are sorted: nothing below the current one is better on its own
        nodes++;
        const trial = choice.slice();
        trial[i] = o;
        const t = totalOf(problem, trial);
        if (t !== null && t > total + EPS) {
          choice[i] = o;
          total = t;
          improved = true;
          break;
        }
      }
    }
    if (!improved) break;
  }
  return { choice, total, exact: false, method: 'greedy-local', nodes };
}

/**
 * Branch and bound over every option of every need, seeded with the heuristic's answer. The bound at each
 * node is the current total plus, for every need still open, its best option that fits the supports and
 * the pair rules against what is already chosen (forward checking); pair penalties are ≤ 0 and interactions
 * among the open needs are ignored, so the bound never underestimates and the answer stays exact.
 */
export function solveExact(problem: AssignProblem, maxNodes: number): AssignSolution {
  for (const need of problem.needs) need.options.sort(byScore);
  // A good first answer makes the bound bite: the greedy answer, improved by an exact search over each
  // need's best few options; then the full search over every option starts from it.
  const greedy = solveHeuristic(problem);
  const few: AssignProblem = { ...problem, needs: problem.needs.map((nd) => ({ ...nd, options: nd.options.slice(0, 24) })) };
  const start = branchAndBound(few, Math.floor(maxNodes / 4), greedy);
  const seed = start.total > greedy.total ? start : greedy;
  const full = branchAndBound(problem, maxNodes - start.nodes, seed);
  return { ...full, nodes: full.nodes + start.nodes + greedy.nodes };
}

function branchAndBound(problem: AssignProblem, maxNodes: number, seed: AssignSolution): AssignSolution {
  const n = problem.needs.length;
  const order = [...problem.needs.keys()].sort(
    (a, b) =>
      (problem.needs[b].priority ?? 0) - (problem.needs[a].priority ?? 0) ||
      problem.needs[a].options.length - problem.needs[b].options.length ||
      a - b,
  );
  let best = seed.total;
  let bestChoice = seed.choice.slice();
  const state = new State(problem);
  const chosen: (AssignOption | null)[] = new Array(n).fill(null); // by order position
  let nodes = 0;
  let aborted = false;
  const compatible = (o: AssignOption, k: number): boolean => {
    if (!state.fits(o)) return false;
    for (let j = 0; j < k; j++) {
      const c = chosen[j];
      if (c && !problem.pair(c, o).allowed) return false;
    }
    return true;
  };
  const openBound = (k: number): number => {
    let sum = 0;
    for (let m = k; m < n; m++) {
      let b = UNASSIGNED_SCORE;
      for (const o of problem.needs[order[m]].options) {
        if (o.score <= b) break;
        if (compatible(o, k)) {
          b = o.score;
          break;
        }
      }
      sum += b;
    }
    return sum;
  };
  const record = (total: number) => {
    best = total;
    bestChoice = new Array(n).fill(null);
    order.forEach((needIdx, k) => (bestChoice[needIdx] = chosen[k]));
  };
  const dfs = (k: number, total: number): void => {
    if (aborted) return;
    if (++nodes > maxNodes) {
      aborted = true;
      return;
    }
    if (k === n) {
      if (total > best + EPS) record(total);
      return;
    }
    const rest = openBound(k + 1);
    if (total + Math.max(UNASSIGNED_SCORE, problem.needs[order[k]].options[0]?.score ?? UNASSIGNED_SCORE) + rest <= best + EPS) return;
    for (const o of problem.needs[order[k]].options) {
      if (total + o.score + rest <= best + EPS) break;
      if (!state.fits(o)) continue;
      const penalty = state.pairPenalty(o, chosen.slice(0, k));
      if (penalty === null) continue;
      state.add(o, 1);
      chosen[k] = o;
      if (total + o.score + penalty + openBound(k + 1) > best + EPS) dfs(k + 1, total + o.score + penalty);
      chosen[k] = null;
      state.add(o, -1);
      if (aborted) return;
    }
    if (total + UNASSIGNED_SCORE + rest > best + EPS) dfs(k + 1, total + UNASSIGNED_SCORE);
  };
  dfs(0, 0);
  return { choice: bestChoice, total: best, exact: !aborted, method: 'branch-and-bound', nodes };
}

/** Every combination: the check the exact solver is tested against (small problems only). */
export function solveBruteForce(problem: AssignProblem): AssignSolution {
  const n = problem.needs.length;
  let best = -Infinity;
  let bestChoice: (AssignOption | null)[] = new Array(n).fill(null);
  let nodes = 0;
  const choice: (AssignOption | null)[] = new Array(n).fill(null);
  const walk = (i: number): void => {
    if (i === n) {
      nodes++;
      const t = totalOf(problem, choice);
      if (t !== null && t > best + EPS) {
        best = t;
        bestChoice = choice.slice();
      }
      return;
    }
    for (const o of [...problem.needs[i].options, null]) {
      choice[i] = o;
      walk(i + 1);
    }
    choice[i] = null;
  };
  walk(0);
  return { choice: bestChoice, total: best, exact: true, method: 'brute-force', nodes };
}
