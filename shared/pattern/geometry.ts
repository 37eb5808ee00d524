import { halfWaveCutM } from '../wire/cut-length';
import { DEFAULT_APEX_DEG, DEFAULT_WIRE_DIAMETER_M, validateDipoleInput } from './input';
import type { DipoleInput } from './types';

/*
 * The wire as two straight legs from the feed point to the ends, in metres: x runs along the wire
 * (end 1 at +x), y across it, z up from the ground plane (z = 0). A flat-top's sag is drawn as a shallow V
 * between the end heights and the feed-point height: with a feed point and coax hanging at the centre the
 * wire is close to two straight lines, and the pattern barely notices the curvature (see README).
 */

export type WirePoint = { xM: number; yM: number; zM: number };

/** One straight leg, from the feed point outward. The current on it is I(s) = sin(k(H − s)), s from the feed. */
export type Leg = { px: number; py: number; pz: number; tx: number; ty: number; tz: number; lengthM: number; sign: 1 | -1 };

export type DipoleGeometry = { legs: [Leg, Leg]; halfLengthM: number; radiusM: number; lowestM: number };

export function dipoleGeometry(input: DipoleInput): DipoleGeometry {
  validateDipoleInput(input);
  const lengthM = input.lengthM ?? halfWaveCutM(input.freqMhz);
  const H = lengthM / 2;
  const radiusM = (input.wireDiameterM ?? DEFAULT_WIRE_DIAMETER_M) / 2;
  if (radiusM * 50 > H) throw new Error('invalid dipole: the wire is too thick for its length for this thin-wire model');
  const h = input.heightM;
  let e1: WirePoint;
  let e2: WirePoint;
  if (input.shape === 'inverted-v') {
    const half = (((input.apexDeg ?? DEFAULT_APEX_DEG) / 2) * Math.PI) / 180;
    const drop = H * Math.cos(half);
    const out = H * Math.sin(half);
    e1 = { xM: out, yM: 0, zM: h - drop };
    e2 = { xM: -out, yM: 0, zM: h - drop };
  } else {
    const [z1, z2] = input.endHeightsM ?? [h, h];
    const d1 = z1 - h;
    const d2 = z2 - h;
    if (Math.abs(d1) >= H || Math.abs(d2) >= H) {
      throw new Error(`invalid dipole: end heights differ from the feed height by more than a leg (${H.toFixed(2)} m)`);
    }
    e1 = { xM: Math.sqrt(H * H - d1 * d1), yM: 0, zM: z1 };
    e2 = { xM: -Math.sqrt(H * H - d2 * d2), yM: 0, zM: z2 };
  }
  const lowestM = Math.min(e1.zM, e2.zM, h);
  if (lowestM <= radiusM * 4) {
    throw new Error(`invalid dipole: part of the wire would be at or below ground (lowest point ${lowestM.toFixed(2)} m)`);
  }
  const leg = (e: WirePoint, sign: 1 | -1): Leg => ({
    px: 0,
    py: 0,
    pz: h,
    tx: e.xM / H,
    ty: 0,
    tz: (e.zM - h) / H,
    lengthM: H,
    sign,
  });
  // Leg 1's current flows outward (+t), leg 2's inward (−t): one continuous current along the wire.
  return { legs: [leg(e1, 1), leg(e2, -1)], halfLengthM: H, radiusM, lowestM };
}

/** The wire as points end 2 → feed → end 1, for drawings. */
export function dipoleWire(input: DipoleInput): { points: WirePoint[]; lengthM: number; lowestM: number } {
  const g = dipoleGeometry(input);
  const [l1, l2] = g.legs;
  const end = (l: typeof l1): WirePoint => ({ xM: l.px + l.tx * l.lengthM, yM: 0, zM: l.pz + l.tz * l.lengthM });
  return { points: [end(l2), { xM: 0, yM: 0, zM: input.heightM }, end(l1)], lengthM: 2 * g.halfLengthM, lowestM: g.lowestM };
}
