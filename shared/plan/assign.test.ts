import { describe, expect, it } from 'vitest';
import { type AssignOption, type AssignProblem, UNASSIGNED_SCORE, solveBruteForce, solveExact, solveHeuristic, totalOf } from './assign';
import { seededRandom } from './random';

/** A random small problem: options on a handful of supports with random scores and random pair conflicts. */
function randomProblem(seed: number, needs: number, perNeed: number, supports: number): AssignProblem {
  const rnd = seededRandom(seed);
  const problem: AssignProblem = {
    needs: [],
    maxEnds: (s) => (Number(s.slice(1)) % 3 === 0 ? 1 : 2),
    pair: () => ({ allowed: true, penalty: 0 }),
  };
  for (let i = 0; i < needs; i++) {
    const options: AssignOption[] = [];
    for (let j = 0; j < perNeed; j++) {
      const a = `S${Math.floor(rnd() * supports)}`;
      const b = `S${Math.floor(rnd() * supports)}`;
      options.push({ id: `n${i}o${j}`, needKey: `n${i}`, score: Math.round((rnd() * 1.3 - 0.3) * 1000) / 1000, supportIds: a === b ? [a] : [a, b] });
    }
    problem.needs.push({ key: `n${i}`, options });
  }
  const verdicts = new Map<string, { allowed: boolean; penalty: number }>();
  problem.pair = (x, y) => {
    const key = x.id < y.id ? `${x.id}|${y.id}` : `${y.id}|${x.id}`;
    let v = verdicts.get(key);
    if (!v) {
      const r = seededRandom(seed * 7919 + key.length * 31 + [...key].reduce((h, c) => (h * 33 + c.charCodeAt(0)) >>> 0, 5381))();
      v = r < 0.25 ? { allowed: false, penalty: 0 } : r < 0.4 ? { allowed: true, penalty: -0.05 } : { allowed: true, penalty: 0 };
      verdicts.set(key, v);
    }
    return v;
  };
  return problem;
}

describe('assignment', () => {
  it('branch and bound finds the brute-force optimum on 60 seeded random small problems', () => {
    for (let seed = 1; seed <= 60; seed++) {
      const needs = 2 + (seed % 4); // 2–5 antennas
      const problem = randomProblem(seed, needs, 3 + (seed % 4), 5 + (seed % 5));
      const brute = solveBruteForce(problem);
      const exact = solveExact(problem, 1_000_000);
      expect(exact.exact).toBe(true);
      expect(exact.total).toBeCloseTo(brute.total, 9);
      expect(totalOf(problem, exact.choice)).toBeCloseTo(exact.total, 9);
    }
  });

  it('the heuristic answer is feasible and never better than the optimum', () => {
    for (let seed = 100; seed < 130; seed++) {
      const problem = randomProblem(seed, 5, 6, 6);
      const h = solveHeuristic(problem);
      const t = totalOf(problem, h.choice);
      expect(t).not.toBeNull();
      expect(h.total).toBeLessThanOrEqual(solveBruteForce(problem).total + 1e-9);
    }
  });

  it('no support carries more ends than it can: two antennas wanting a one-end mast share it out', () => {
    const problem: AssignProblem = {
      needs: [
        { key: 'a', options: [{ id: 'a1', needKey: 'a', score: 0.9, supportIds: ['M1'] }, { id: 'a2', needKey: 'a', score: 0.5, supportIds: ['T1'] }] },
        { key: 'b', options: [{ id: 'b1', needKey: 'b', score: 0.8, supportIds: ['M1'] }, { id: 'b2', needKey: 'b', score: 0.2, supportIds: ['T2'] }] },
      ],
      maxEnds: (s) => (s === 'M1' ? 1 : 2),
      pair: () => ({ allowed: true, penalty: 0 }),
    };
    const r = solveExact(problem, 1000);
    expect(r.choice.map((c) => c?.id)).toEqual(['a2', 'b1']); // 0.5 + 0.8 beats 0.9 + 0.2
    expect(r.total).toBeCloseTo(1.3, 9);
  });

  it('an antenna with no usable option is left unassigned and costs UNASSIGNED_SCORE', () => {
    const problem: AssignProblem = { needs: [{ key: 'a', options: [] }], maxEnds: () => 2, pair: () => ({ allowed: true, penalty: 0 }) };
    const r = solveExact(problem, 1000);
    expect(r.choice).toEqual([null]);
    expect(r.total).toBe(UNASSIGNED_SCORE);
  });

  it('a node limit makes the answer non-exact rather than wrong', () => {
    const problem = randomProblem(7, 7, 30, 12);
    const r = solveExact(problem, 50);
    expect(r.exact).toBe(false);
    expect(totalOf(problem, r.choice)).toBeCloseTo(r.total, 9);
  });
});
