import { gaussLegendre } from './gauss';
import type { Leg } from './geometry';

/*
 * Feed-point impedance by the induced-EMF (reaction) method for an assumed sinusoidal current
 * I(s) = sin(k(H − s)) on every leg (s measured from the feed point). In mixed-potential form, for currents
 * that vanish at the wire ends (time convention e^{+jωt}, η the impedance of free space):
 *
 *   Z = (jkη/4π) / I_in² · ∫∫ [ ĉ·ĉ' I(s) I(s') − (1/k²) İ(s) İ(s') ] e^{−jkR}/R ds ds'
 *
 * with ĉ the direction the current flows, İ its derivative along that direction and I_in = sin(kH) the feed
 * current. The thin-wire "reduced kernel" R = √(|r − r'|² + a²) puts the source on the wire axis and the
 * observation on its surface. For the inner integral we substitute u = u0 + ρ·sinh v (u0 the foot of the
 * perpendicular from the observation point, ρ its distance including a), which turns the near-singular
 * 1/R peak into a smooth integrand (Gauss in v), so the same code serves the self, adjacent-leg and image terms.
 * Reference: the mixed-potential reaction integral is textbook (Balanis §8.5, Harrington "Field Computation
 * by Moment Methods"); for a straight λ/2 dipole it reproduces 73.1 + j42.5 Ω (tests).
 */

export const ETA0_OHM = 376.730313668;

/** The image of a leg in the ground plane z = 0 (position and direction mirrored; used with a −1 current factor). */
export function mirrorLeg(l: Leg): Leg {
  return { px: l.px, py: l.py, pz: -l.pz, tx: l.tx, ty: l.ty, tz: -l.tz, lengthM: l.lengthM, sign: l.sign };
}

/**
 * Reaction ∫∫[…] G between the currents on leg A (observation, on the wire surface) and leg B (source),
 * returned as [re, im] of (jkη/4π)·∫∫, NOT divided by I_in². Both carry sin(k(H − s)).
 */
export function legReaction(a: Leg, b: Leg, k: number, H: number, radiusM: number, nOuter: number, nInner: number): [number, number] {
  const go = gaussLegendre(nOuter);
  const gi = gaussLegendre(nInner);
  const dot = a.tx * b.tx + a.ty * b.ty + a.tz * b.tz;
  const ss = a.sign * b.sign;
  const a2 = radiusM * radiusM;
  const halfA = a.lengthM / 2;
  let sumRe = 0;
  let sumIm = 0;
  for (let i = 0; i < nOuter; i++) {
    const s = halfA * (1 + go.x[i]);
    const rx = a.px + a.tx * s - b.px;
    const ry = a.py + a.ty * s - b.py;
    const rz = a.pz + a.tz * s - b.pz;
    const u0 = rx * b.tx + ry * b.ty + rz * b.tz;
    const px = rx - u0 * b.tx;
    const py = ry - u0 * b.ty;
    const pz = rz - u0 * b.tz;
    const rho = Math.sqrt(px * px + py * py + pz * pz + a2);
    const va = Math.asinh(-u0 / rho);
    const vb = Math.asinh((b.lengthM - u0) / rho);
    const hv = (vb - va) / 2;
    const mv = (vb + va) / 2;
    const argO = k * (H - s);
    const sinO = Math.sin(argO);
    const cosO = Math.cos(argO);
    let inRe = 0;
    let inIm = 0;
    for (let j = 0; j < nInner; j++) {
      const v = mv + hv * gi.x[j];
      const ev = Math.exp(v);
      const sh = (ev - 1 / ev) / 2;
      const ch = (ev + 1 / ev) / 2;
      const u = u0 + rho * sh;
      const R = rho * ch;
      const argI = k * (H - u);
      // du/R = dv: the kernel's 1/R is absorbed by the substitution.
      const f = (dot * sinO * Math.sin(argI) - cosO * Math.cos(argI)) * gi.w[j];
      const kr = k * R;
      inRe += f * Math.cos(kr);
      inIm -= f * Math.sin(kr);
    }
    const wO = go.w[i] * halfA * hv;
    sumRe += inRe * wO;
    sumIm += inIm * wO;
  }
  // multiply by j·k·η/(4π)·(sign product)
  const c = (ss * k * ETA0_OHM) / (4 * Math.PI);
  return [-sumIm * c, sumRe * c];
}

export type QuadratureOrders = { selfOuter: number; selfInner: number; imageOuter: number; imageInner: number };

/** Quadrature orders that scale with the electrical length of a leg (checked for convergence in the tests). */
export function defaultOrders(k: number, legM: number, scale = 1): QuadratureOrders {
  const kl = k * legM;
  const r = (n: number) => Math.max(4, Math.ceil(n * scale));
  return { selfOuter: r(8 + 3 * kl), selfInner: r(14 + 3 * kl), imageOuter: r(4 + 2.5 * kl), imageInner: r(4 + 2.5 * kl) };
}

/**
 * Free-space self impedance of the wire and its mutual impedance with the perfect-ground image, both
 * referred to the feed current. Over ground the feed sees Z = Zself + ρ·Zimage (see feed model).
 */
export function dipoleImpedances(
  legs: readonly [Leg, Leg],
  k: number,
  H: number,
  radiusM: number,
  withImage: boolean,
  orders: QuadratureOrders,
  symmetric = false,
): { self: [number, number]; image: [number, number] } {
  const iin = Math.sin(k * H);
  const inv = 1 / (iin * iin);
  const [l1, l2] = legs;
  const { selfOuter: so, selfInner: si } = orders;
  const z11 = legReaction(l1, l1, k, H, radiusM, so, si);
  // Mirror-symmetric legs: the pairs repeat (Z22 = Z11, Z21 = Z12), so half the work is skipped.
  const z22 = symmetric ? z11 : legReaction(l2, l2, k, H, radiusM, so, si);
  const z12 = legReaction(l1, l2, k, H, radiusM, so, si);
  const z21 = symmetric ? z12 : legReaction(l2, l1, k, H, radiusM, so, si);
  const self: [number, number] = [(z11[0] + z22[0] + z12[0] + z21[0]) * inv, (z11[1] + z22[1] + z12[1] + z21[1]) * inv];
  const image: [number, number] = [0, 0];
  if (withImage) {
    const m1 = mirrorLeg(l1);
    const m2 = mirrorLeg(l2);
    const { imageOuter: io, imageInner: ii } = orders;
    // The image current is −I along the mirrored path (a perfect conductor reverses horizontal currents).
    const pairs = symmetric ? ([[l1, m1, 2], [l1, m2, 2]] as const) : ([[l1, m1, 1], [l1, m2, 1], [l2, m1, 1], [l2, m2, 1]] as const);
    for (const [a, b, times] of pairs) {
      const z = legReaction(a, b, k, H, 0, io, ii);
      image[0] -= z[0] * inv * times;
      image[1] -= z[1] * inv * times;
    }
  }
  return { self, image };
}
