// propose + assign (planSite) on generated parks of 50, 200 and 500 supports with 6 stations on 6 bands,
// next to the straightforward reference in the same run: every support pair evaluated from scratch, no
// spatial pruning and no pattern cache (planSite with pruneAndCache: false). Prints figures; asserts nothing.
import { performance } from 'node:perf_hooks';
import { generateDemoSite, planSite, seededRandom } from '../../shared/plan';

const SIZES = [50, 200, 500];
const SEED = 20261201;

// CPU time of this process (user + system) is the figure compared: on a shared machine the wall clock
// also counts other people's work. Wall time is printed beside it.
function time<T>(fn: () => T): { ms: number; wallMs: number; value: T } {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  const value = fn();
  const c = process.cpuUsage(c0);
  return { ms: (c.user + c.system) / 1000, wallMs: performance.now() - t0, value };
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

export async function run(): Promise<void> {
  // Warm the JIT on a small park so the first measured size is not penalised.
  planSite(generateDemoSite({ supports: 30, random: seededRandom(1) }));
  const rows: { n: number; ms: number; wallMs: number; refMs: number; candidates: number; pairs: number; refPairs: number; patterns: number; refPatterns: number; exact: boolean }[] = [];
  for (const n of SIZES) {
    const site = generateDemoSite({ supports: n, random: seededRandom(SEED) });
    const runs = [0, 1, 2].map(() => time(() => planSite(site)));
    const fast = runs[0].value;
    const ref = time(() => planSite(site, { pruneAndCache: false }));
    if (Math.abs(ref.value.assignment.totalScore - fast.assignment.totalScore) > 0.05) {
      console.log(`  note: reference total ${ref.value.assignment.totalScore.toFixed(3)} vs ${fast.assignment.totalScore.toFixed(3)} (pattern height buckets differ)`);
    }
    rows.push({
      n,
      ms: median(runs.map((r) => r.ms)),
      wallMs: median(runs.map((r) => r.wallMs)),
      refMs: ref.ms,
      candidates: fast.stats.candidates,
      pairs: fast.stats.pairsConsidered,
      refPairs: ref.value.stats.pairsConsidered,
      patterns: fast.stats.patternEvaluations,
      refPatterns: ref.value.stats.patternEvaluations,
      exact: fast.assignment.exact,
    });
  }
  console.log('supports  candidates  pairs(fast/ref)    patterns(fast/ref)  planSite cpu ms (wall)  cand/s     reference cpu ms  speed-up  exact');
  for (const r of rows) {
    console.log(
      `${String(r.n).padStart(8)}  ${String(r.candidates).padStart(10)}  ${`${r.pairs}/${r.refPairs}`.padStart(17)}  ${`${r.patterns}/${r.refPatterns}`.padStart(18)}  ` +
        `${`${r.ms.toFixed(0)} (${r.wallMs.toFixed(0)})`.padStart(22)}  ${Math.round(r.candidates / (r.ms / 1000)).toString().padStart(9)}  ${r.refMs.toFixed(0).padStart(16)}  ${(r.refMs / r.ms).toFixed(1).padStart(7)}×  ${r.exact}`,
    );
  }
  for (let i = 1; i < rows.length; i++) {
    const a = rows[i - 1];
    const b = rows[i];
    const k = Math.log(b.ms / a.ms) / Math.log(b.n / a.n);
    const kr = Math.log(b.refMs / a.refMs) / Math.log(b.n / a.n);
    console.log(`growth ${a.n}→${b.n} supports: time ∝ n^${k.toFixed(2)} (reference n^${kr.toFixed(2)})`);
  }
  const last = rows[rows.length - 1];
  console.log(`aim: 500 supports under 2000 ms (${last.ms.toFixed(0)} ms) and ≥ 10× the reference (${(last.refMs / last.ms).toFixed(1)}×)`);
}
