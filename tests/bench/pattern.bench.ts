// Pattern summaries: the fast path (shared/pattern summarizePattern) against the brute 1° hemisphere reference
// (shared/pattern/reference.ts) on the same seeded inputs, one core. Prints figures; asserts nothing.
import { groundFromClass, GROUND_CLASS_NAMES } from '../../shared/ground';
import { summarizePattern, type DipoleInput, type PatternSummary } from '../../shared/pattern';
import { referenceSummary } from '../../shared/pattern/reference';
import { halfWaveCutM } from '../../shared/wire';

const N = 10_000;
const N_REFERENCE = 100;

function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

export function inputs(n: number): DipoleInput[] {
  const rnd = lcg(20261201);
  const grounds = GROUND_CLASS_NAMES.map((g) => groundFromClass(g));
  const freqs = [1.9, 3.6, 5.35, 7.15, 10.12, 14.175, 18.118, 21.225, 24.94, 28.5, 50.5];
  const out: DipoleInput[] = [];
  for (let i = 0; i < n; i++) {
    const freqMhz = freqs[Math.floor(rnd() * freqs.length)] * (0.98 + 0.04 * rnd());
    const ground = grounds[Math.floor(rnd() * grounds.length)];
    const lengthM = halfWaveCutM(freqMhz);
    if (rnd() < 0.35) {
      const apexDeg = 90 + 60 * rnd();
      const minApex = (lengthM / 2) * Math.cos((apexDeg * Math.PI) / 360) + 1;
      out.push({ freqMhz, ground, shape: 'inverted-v', heightM: Math.max(minApex, 4 + 26 * rnd()), apexDeg });
    } else {
      out.push({ freqMhz, ground, shape: 'flat', heightM: 4 + 26 * rnd() });
    }
  }
  return out;
}

// Wall time and the process's CPU time (the machine may be shared; CPU time is the steadier figure).
function timePerCall(list: DipoleInput[], f: (i: DipoleInput) => PatternSummary): { usPer: number; cpuUsPer: number; results: PatternSummary[] } {
  const results: PatternSummary[] = [];
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  for (const i of list) results.push(f(i));
  const wall = (performance.now() - t0) * 1000;
  const cpu = process.cpuUsage(c0);
  return { usPer: wall / list.length, cpuUsPer: (cpu.user + cpu.system) / list.length, results };
}

/** CPU ns per Math.sin + Math.cos pair: a yardstick for how busy or slow this machine is during the run. */
function trigYardstickNs(): number {
  const n = 2_000_000;
  let acc = 0;
  const c0 = process.cpuUsage();
  for (let i = 0; i < n; i++) acc += Math.sin(i * 1e-3) + Math.cos(i * 1e-3);
  const c = process.cpuUsage(c0);
  if (acc === 42) console.log('');
  return ((c.user + c.system) * 1000) / n;
}

export async function run(): Promise<void> {
  const list = inputs(N);
  timePerCall(list.slice(0, 2000), summarizePattern); // warm-up (JIT), not counted
  const fast = timePerCall(list, summarizePattern);
  const subset = list.slice(0, N_REFERENCE);
  const ref = timePerCall(subset, referenceSummary);
  let maxDb = 0;
  let maxDeg = 0;
  let maxLossDb = 0;
  let maxOhm = 0;
  for (let i = 0; i < subset.length; i++) {
    const a = fast.results[i];
    const b = ref.results[i];
    maxDb = Math.max(maxDb, Math.abs(a.peakGainDbi - b.peakGainDbi), ...a.windows.map((w, j) => Math.abs(w.meanGainDbi - b.windows[j].meanGainDbi)));
    maxDeg = Math.max(maxDeg, Math.abs(a.takeoffDeg - b.takeoffDeg), Math.abs(a.halfPower.lowDeg - b.halfPower.lowDeg), Math.abs(a.halfPower.highDeg - b.halfPower.highDeg));
    maxLossDb = Math.max(maxLossDb, Math.abs(a.groundLossDb - b.groundLossDb));
    maxOhm = Math.max(maxOhm, Math.abs(a.feed.resistanceOhm - b.feed.resistanceOhm), Math.abs(a.feed.reactanceOhm - b.feed.reactanceOhm));
  }
  console.log(`summaries:            ${N} (flat and inverted-V, 1.8–52 MHz, 4–30 m, all ${GROUND_CLASS_NAMES.length} ground classes)`);
  console.log(`fast summary:         ${fast.usPer.toFixed(1)} µs wall, ${fast.cpuUsPer.toFixed(1)} µs CPU per summary (aim ≤ 50 µs)`);
  console.log(`reference (1° grid):  ${ref.usPer.toFixed(0)} µs wall, ${ref.cpuUsPer.toFixed(0)} µs CPU per summary (first ${N_REFERENCE} of the same inputs)`);
  console.log(`speed-up:             ${(ref.usPer / fast.usPer).toFixed(0)}× wall, ${(ref.cpuUsPer / fast.cpuUsPer).toFixed(0)}× CPU (aim ≥ 20×)`);
  console.log(`max disagreement:     ${maxDb.toFixed(4)} dB (peak, window means; aim ≤ 0.05), ${maxDeg.toFixed(4)}° (takeoff, half-power edges; aim ≤ 0.1)`);
  console.log(`                      ground loss ${maxLossDb.toFixed(4)} dB, feed impedance ${maxOhm.toFixed(3)} Ω (independent double-integral EMF)`);
  console.log(`machine yardstick:    ${trigYardstickNs().toFixed(1)} ns CPU per Math.sin + Math.cos pair in this run (scale the µs above by it)`);
}
