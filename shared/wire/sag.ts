/*
 * Sag of a wire span between two supports (statics textbooks, from memory):
 *  - catenary, wire weight w per metre, horizontal tension T: sag at mid-span = a·(cosh(L/2a) − 1), a = T/w;
 *  - parabola (shallow spans): w·L²/(8T) — the catenary's first term, so they agree when the sag is small;
 *  - a concentrated load P at mid-span (the feed point and the coax hanging from it) adds P·L/(4T).
 * Supports of unequal height: for a shallow span the sag is measured below the straight chord and the
 * same expressions hold; the loads superpose (small-sag approximation). Tension in newtons, weights in N/m.
 */

/** 14 AWG bare copper: 12.43 lb per 1000 ft [doc] = 0.1814 N/m. */
export const WIRE_14AWG_N_PER_M = (12.43 * 4.4482216152605) / 304.8;

export type SpanLoad = {
  spanM: number;
  tensionN: number;
  /** Weight of the wire per metre (default 14 AWG copper). */
  wireWeightNPerM?: number;
  /** Concentrated load at mid-span: feed point, balun and the hanging coax (default 0). */
  pointLoadN?: number;
  method?: 'catenary' | 'parabola';
};

function check(o: SpanLoad): { L: number; T: number; w: number; P: number } {
  const L = o.spanM, T = o.tensionN, w = o.wireWeightNPerM ?? WIRE_14AWG_N_PER_M, P = o.pointLoadN ?? 0;
  if (!Number.isFinite(L) || L <= 0) throw new Error(`span must be above 0 m (got ${L})`);
  if (!Number.isFinite(T) || T <= 0) throw new Error(`tension must be above 0 N (got ${T})`);
  if (!Number.isFinite(w) || w <= 0) throw new Error(`wire weight must be above 0 N/m (got ${w})`);
  if (!Number.isFinite(P) || P < 0) throw new Error(`point load must be ≥ 0 N (got ${P})`);
  return { L, T, w, P };
}

/** Mid-span sag below the chord, metres. */
export function spanSagM(o: SpanLoad): number {
  const { L, T, w, P } = check(o);
  const point = (P * L) / (4 * T);
  if (o.method === 'parabola') return (w * L * L) / (8 * T) + point;
  const a = T / w;
  return a * (Math.cosh(L / (2 * a)) - 1) + point;
}

/** Weight the feed point carries: the coax hanging from it down to the ground plus a balun or choke. */
export function feedPointLoadN(o: { coaxWeightNPerM: number; dropM: number; balunN?: number }): number {
  if (!(o.coaxWeightNPerM >= 0) || !(o.dropM >= 0) || !((o.balunN ?? 0) >= 0)) throw new Error('coax weight, drop and balun weight must be ≥ 0');
  return o.coaxWeightNPerM * o.dropM + (o.balunN ?? 0);
}

export type FlatTopSpan = {
  /** Height of the wire at mid-span (the feed point). */
  feedHeightM: number;
  /** Mid-span sag below the chord. */
  sagM: number;
  lowestM: number;
  /** Horizontal distance of the lowest point from support 1. */
  lowestFromEnd1M: number;
  /** Length of wire (plus rope) along the sagging span. */
  arcLengthM: number;
};

/**
 * A flat-top between attachment points of heights h1 and h2 a horizontal distance spanM apart: the
 * sag curve (parabola + mid-span point-load triangle below the chord), the feed height and the lowest point.
 */
export function flatTopSpan(o: SpanLoad & { endHeightsM: [number, number] }): FlatTopSpan {
  const { L, T, w, P } = check(o);
  const [h1, h2] = o.endHeightsM;
  if (!(h1 > 0 && h2 > 0)) throw new Error('support attachment heights must be above 0 m');
  const y = (x: number) => h1 + ((h2 - h1) * x) / L - (w * x * (L - x)) / (2 * T) - (P * Math.min(x, L - x)) / (2 * T);
  const n = 400;
  let lowestM = Infinity, lowestFromEnd1M = 0, arc = 0, prev = y(0);
  for (let i = 0; i <= n; i++) {
    const x = (L * i) / n;
    const v = y(x);
    if (v < lowestM) {
      lowestM = v;
      lowestFromEnd1M = x;
    }
    if (i > 0) arc += Math.hypot(L / n, v - prev);
    prev = v;
  }
  const sagM = spanSagM({ ...o, method: 'parabola' });
  return { feedHeightM: y(L / 2), sagM, lowestM, lowestFromEnd1M, arcLengthM: arc };
}
