import { gaussLegendre } from './gauss';
import type { Leg } from './geometry';
import { ETA0_OHM, mirrorLeg } from './induced-emf';

/*
 * Closed-form near field of a straight leg carrying the sinusoidal current I(z') = sin(k(H − z')),
 * 0 ≤ z' ≤ ℓ along its axis. Because I'' + k²I = 0, integrating the potentials by parts leaves only end terms
 * (Schelkunoff's result for sinusoidal filaments; derivation in DEVELOPERS.md):
 *   E_z = (−jη/4πk) [ I ∂g/∂z' − I' g ]_{z'=0}^{ℓ}
 *   E_ρ = (−jη/4πk) [ −I ∂g/∂ρ − (jk/ρ) e^{−jkR} (I − j(w/R) I'/k) ]_{z'=0}^{ℓ},   w = z' − z,
 * g = e^{−jkR}/R, R = √(ρ² + w²). These include the fields of the point charges where the leg's current
 * starts and stops; at the feed point the two legs' charges are equal and opposite and cancel.
 * The induced EMF then needs one integral along each observation leg instead of a double integral.
 */

const C0 = ETA0_OHM / (4 * Math.PI);

export type LegSource = Leg & { factor: number; i0: number; d0: number; iL: number; dL: number };

function source(l: Leg, factor: number, k: number, H: number): LegSource {
  // current and its derivative at the feed end (z' = 0) and the far end (z' = ℓ)
  // written out field by field: a spread would give V8 a slow object shape in the hot loop
  return {
    px: l.px, py: l.py, pz: l.pz, tx: l.tx, ty: l.ty, tz: l.tz, lengthM: l.lengthM, sign: l.sign, factor,
    i0: Math.sin(k * H), d0: -k * Math.cos(k * H), iL: Math.sin(k * (H - l.lengthM)), dL: -k * Math.cos(k * (H - l.lengthM)),
  };
}

let ezr = 0, ezi = 0, epr = 0, epi = 0;
let lastKr = NaN, lastCos = 0, lastSin = 0;

/** Adds one end's terms (sg = −1 at z' = 0, +1 at z' = ℓ) to the module accumulators (hot path, no allocation). */
function endTerms(k: number, rho: number, rho2: number, w: number, iv: number, ip: number, sg: number): void {
  const R2 = rho2 + w * w;
  const R = Math.sqrt(R2);
  const kr = k * R;
  // Both legs start at the feed point, so their feed-end distances repeat: reuse the last cos/sin there.
  let cosKr: number, sinKr: number;
  if (sg < 0) {
    if (!(Math.abs(kr - lastKr) <= 1e-13 * kr)) {
      lastKr = kr;
      lastCos = Math.cos(kr);
      lastSin = Math.sin(kr);
    }
    cosKr = lastCos;
    sinKr = lastSin;
  } else {
    cosKr = Math.cos(kr);
    sinKr = Math.sin(kr);
  }
  const cr = cosKr / R, ci = -sinKr / R; // g
  const R2i = 1 / R2;
  // (1 + jkR)·g / R²
  const fr = (cr - kr * ci) * R2i, fi = (ci + kr * cr) * R2i;
  // E_z end term: I·(−w)(1+jkR)g/R² − I'·g
  ezr += sg * (-iv * w * fr - ip * cr);
  ezi += sg * (-iv * w * fi - ip * ci);
  // E_ρ end term: I·ρ(1+jkR)g/R² − (jk/ρ)·R·g·(I − j(w/R)I'/k)
  const bi = (-(w / R) * ip) / k;
  const gr = (cr * iv - ci * bi) * R, gi = (cr * bi + ci * iv) * R;
  epr += sg * (iv * rho * fr + (k / rho) * gi);
  epi += sg * (iv * rho * fi - (k / rho) * gr);
}

/**
 * Tangential field E·t̂_obs (per unit current amplitude, divided by −jη/4πk; returned as [re, im] after the
 * prefactor) of source leg `s` at point (x, y, z) for observation direction t̂.
 */
function fieldAlong(s: LegSource, k: number, a2: number, x: number, y: number, z: number, tx: number, ty: number, tz: number, out: Float64Array): void {
  const dx = x - s.px, dy = y - s.py, dz = z - s.pz;
  const zl = dx * s.tx + dy * s.ty + dz * s.tz;
  const qx = dx - zl * s.tx, qy = dy - zl * s.ty, qz = dz - zl * s.tz;
  const rho2 = qx * qx + qy * qy + qz * qz + a2;
  const rho = Math.sqrt(rho2);
  const cosT = s.tx * tx + s.ty * ty + s.tz * tz;
  const radT = (qx * tx + qy * ty + qz * tz) / rho;
  ezr = 0; ezi = 0; epr = 0; epi = 0;
  endTerms(k, rho, rho2, -zl, s.i0, s.d0, -1);
  endTerms(k, rho, rho2, s.lengthM - zl, s.iL, s.dL, 1);
  const vr = ezr * cosT + epr * radT;
  const vi = ezi * cosT + epi * radT;
  // times −jη/(4πk)
  out[0] = (C0 / k) * vi * s.factor * s.sign;
  out[1] = (-C0 / k) * vr * s.factor * s.sign;
}

/**
 * Self impedance (free space) and mutual impedance with the perfect-ground image, referred to the feed
 * current, by Z = −(1/I_in²) Σ_obs ∫ I(s) E·ĉ ds. The observation integral uses s = a·sinh v so the
 * 1/s-type peak at the feed point is smooth in v (Gauss–Legendre in v).
 */
export function dipoleImpedancesFast(
  legs: readonly [Leg, Leg],
  k: number,
  H: number,
  radiusM: number,
  withImage: boolean,
  symmetric: boolean,
  scale = 1,
): { self: [number, number]; image: [number, number] } {
  const selfSrc: LegSource[] = [source(legs[0], 1, k, H), source(legs[1], 1, k, H)];
  const imgSrc: LegSource[] = withImage ? [source(mirrorLeg(legs[0]), -1, k, H), source(mirrorLeg(legs[1]), -1, k, H)] : [];
  const out = new Float64Array(2);
  let sr = 0, si = 0, ir = 0, ii = 0;
  const obsLegs = symmetric ? [legs[0]] : [legs[0], legs[1]];
  for (const ob of obsLegs) {
    const vMax = Math.asinh(ob.lengthM / radiusM);
    const rule = gaussLegendre(Math.max(8, Math.ceil((8 + 0.6 * vMax + 2 * k * ob.lengthM) * scale)));
    const hv = vMax / 2;
    for (let n = 0; n < rule.x.length; n++) {
      const v = hv * (1 + rule.x[n]);
      const ev = Math.exp(v);
      const sArc = (radiusM * (ev - 1 / ev)) / 2;
      const ds = (radiusM * (ev + 1 / ev)) / 2; // ds/dv
      // observation on the wire surface: offset by the radius perpendicular to the leg (in the y direction)
      const x = ob.px + ob.tx * sArc, y = ob.py + radiusM, z = ob.pz + ob.tz * sArc;
      const wgt = rule.w[n] * hv * ds * Math.sin(k * (H - sArc)) * ob.sign;
      for (let q = 0; q < selfSrc.length; q++) {
        fieldAlong(selfSrc[q], k, 0, x, y, z, ob.tx, ob.ty, ob.tz, out);
        sr += wgt * out[0];
        si += wgt * out[1];
      }
      for (let q = 0; q < imgSrc.length; q++) {
        fieldAlong(imgSrc[q], k, 0, x, y, z, ob.tx, ob.ty, ob.tz, out);
        ir += wgt * out[0];
        ii += wgt * out[1];
      }
    }
  }
  const times = symmetric ? 2 : 1;
  const iin = Math.sin(k * H);
  const c = -times / (iin * iin);
  return { self: [sr * c, si * c], image: [ir * c, ii * c] };
}
