import { complexPermittivity, csqrt, wavelengthM } from '../ground';
import { dipoleGeometry, type Leg } from './geometry';
import { defaultOrders, dipoleImpedances, ETA0_OHM } from './induced-emf';
import { dipoleImpedancesFast } from './leg-field';
import type { DipoleInput } from './types';

/*
 * A dipole prepared for evaluation at one frequency: geometry, ground constants, feed impedance and the
 * normalisation that turns |N|² into gain relative to the power into the feed point:
 *   G(Δ, φ) = η k² |N⊥|² / (4π · I_in² · R_in)        (N the radiation vector with I_m = 1, I_in = sin kH)
 * Over ground the reflected wave is the perfect-ground image's field with each polarisation scaled by its
 * Fresnel coefficient at the grazing angle Δ: vertical (θ̂) by Γv, horizontal (φ̂) by −Γh (both are 1 for a
 * perfect conductor). This is the reflection-coefficient approximation; it omits the surface wave, which
 * carries little for horizontal wires above ~0.1 λ.
 */

export type PreparedDipole = {
  input: DipoleInput;
  k: number;
  lambdaM: number;
  H: number;
  legs: [Leg, Leg];
  ground: DipoleInput['ground']['kind'];
  epsRe: number;
  epsIm: number;
  zSelf: [number, number];
  zImage: [number, number];
  feed: { resistanceOhm: number; reactanceOhm: number };
  /** Multiply |N⊥|² by this to get linear gain. */
  gainScale: number;
  /** Height of the lowest point of the wire. */
  lowestM: number;
  /** Whether leg 2 mirrors leg 1 across x = 0 (then the pattern is symmetric about the broadside plane). */
  symmetric: boolean;
  /** Per-elevation memo of gainLinear (see fillRow). */
  rowCache: Float64Array;
  /** Last [a1, cos a1, sin a1] of each leg (gainLinear's scratch). */
  trigCache: Float64Array;
  /** cos/sin of k·ℓ (leg length ℓ = H). */
  cosKL: number;
  sinKL: number;
};

/** Normal-incidence reflection factor ρ = (√εc − 1)/(√εc + 1) of the ground for the image's near field. */
export function normalReflection(epsRe: number, epsIm: number): [number, number] {
  const r = csqrt(epsRe, epsIm);
  const nr = r.re - 1, ni = r.im, dr = r.re + 1, di = r.im;
  const d = dr * dr + di * di;
  return [(nr * dr + ni * di) / d, (ni * dr - nr * di) / d];
}

/**
 * `method`: 'closed-form' (default) integrates the closed-form leg fields along the wire (one integral);
 * 'double-integral' evaluates the mixed-potential reaction integral directly (independent, slower; the
 * reference implementation uses it to check the fast path).
 */
export function prepareDipole(input: DipoleInput, quadratureScale = 1, method: 'closed-form' | 'double-integral' = 'closed-form'): PreparedDipole {
  const g = dipoleGeometry(input);
  const lambdaM = wavelengthM(input.freqMhz);
  const k = (2 * Math.PI) / lambdaM;
  const H = g.halfLengthM;
  const kind = input.ground.kind;
  const [l1, l2] = g.legs;
  const symmetric = Math.abs(l1.tx + l2.tx) < 1e-12 && Math.abs(l1.tz - l2.tz) < 1e-12;
  const z =
    method === 'closed-form'
      ? dipoleImpedancesFast(g.legs, k, H, g.radiusM, kind !== 'free-space', symmetric, quadratureScale)
      : dipoleImpedances(g.legs, k, H, g.radiusM, kind !== 'free-space', defaultOrders(k, H, quadratureScale), symmetric);
  let epsRe = 1, epsIm = 0;
  let rho: [number, number] = [0, 0];
  if (kind === 'perfect') rho = [1, 0];
  if (input.ground.kind === 'real') {
    const e = complexPermittivity(input.ground.sigmaSPerM, input.ground.epsR, input.freqMhz);
    epsRe = e.re;
    epsIm = e.im;
    rho = normalReflection(epsRe, epsIm);
  }
  const resistanceOhm = z.self[0] + rho[0] * z.image[0] - rho[1] * z.image[1];
  const reactanceOhm = z.self[1] + rho[0] * z.image[1] + rho[1] * z.image[0];
  const iin = Math.sin(k * H);
  return {
    input,
    k,
    lambdaM,
    H,
    legs: g.legs,
    ground: kind,
    epsRe,
    epsIm,
    zSelf: z.self,
    zImage: z.image,
    feed: { resistanceOhm, reactanceOhm },
    gainScale: (ETA0_OHM * k * k) / (4 * Math.PI * iin * iin * resistanceOhm),
    symmetric,
    lowestM: g.lowestM,
    trigCache: new Float64Array([NaN, 0, 0, NaN, 0, 0]),
    rowCache: new Float64Array([NaN, 0, 0, 0, 0, 0, 0]),
    cosKL: Math.cos(k * H),
    sinKL: Math.sin(k * H),
  };
}

/*
 * Far-field radiation vector N = Σ legs ĉ ∫ I(s) e^{jk r̂·r(s)} ds for the sinusoidal current on straight legs,
 * in closed form: with q = r̂·t̂ and a leg from the feed point p (s = 0) to s = ℓ,
 *   ∫₀^ℓ sin(k(H − s)) e^{jk(r̂·p + qs)} ds = e^{jk r̂·p}·(ℓ/2j)·[ e^{j(kH + a1)} sinc a1 − e^{j(−kH + a2)} sinc a2 ],
 *   a1 = k(q − 1)ℓ/2, a2 = k(q + 1)ℓ/2 = a1 + kℓ
 * (sin written as two exponentials; sinc keeps the end-fire limit finite). The wire lies in the x–z plane
 * with the feed at (0, 0, h), so t_y = 0 and e^{jk r̂·p} = e^{jkh sinΔ} (its conjugate for the image).
 * Written out with scalars: it runs for every direction of every summary (and 33 000 times per reference).
 */

let accRe = 0;
let accIm = 0;

/**
 * Leg integral into (accRe, accIm) for phase factor (e0r, e0i) = e^{jk r̂·p}, given c1 + j·s1 = e^{j·a1},
 * (ckh, skh) = e^{jkH} and kl = kℓ; every leg is half the wire, so ℓ = H and e^{jkℓ} = e^{jkH}. Scalars only.
 */
function legIntegral(kl: number, l: number, a1: number, c1: number, s1: number, e0r: number, e0i: number, ckh: number, skh: number): void {
  const c2 = c1 * ckh - s1 * skh;
  const s2 = s1 * ckh + c1 * skh;
  const a2 = a1 + kl;
  const sc1 = Math.abs(a1) < 1e-7 ? 1 : s1 / a1;
  const sc2 = Math.abs(a2) < 1e-7 ? 1 : s2 / a2;
  // e^{j(kH + a1)} and e^{j(−kH + a2)}
  const p1r = ckh * c1 - skh * s1;
  const p1i = skh * c1 + ckh * s1;
  const p2r = ckh * c2 + skh * s2;
  const p2i = ckh * s2 - skh * c2;
  const dr = sc1 * p1r - sc2 * p2r;
  const di = sc1 * p1i - sc2 * p2i;
  // times e0, times (ℓ/2)(−j)
  const xr = dr * e0r - di * e0i;
  const xi = dr * e0i + di * e0r;
  accRe = (xi * l) / 2;
  accIm = (-xr * l) / 2;
}

/**
 * Fills m.rowCache for elevation sin Δ: [sinΔ, cos ph0, sin ph0, Γh re, Γh im, Γv re, Γv im], with
 * ph0 = k·h·sinΔ and the Fresnel coefficients at grazing angle Δ (see ground/fresnel.ts; inlined, no allocation).
 */
function fillRow(m: PreparedDipole, sinE: number): void {
  const rc = m.rowCache;
  const ph0 = m.k * m.legs[0].pz * sinE;
  rc[0] = sinE;
  rc[1] = Math.cos(ph0);
  rc[2] = Math.sin(ph0);
  if (m.ground !== 'real') return;
  const cos2 = 1 - sinE * sinE;
  const wr = m.epsRe - cos2, wi = m.epsIm;
  const mag = Math.sqrt(wr * wr + wi * wi);
  const rr = Math.sqrt((mag + wr) / 2);
  let ri = Math.sqrt(Math.max(0, (mag - wr) / 2));
  if (wi < 0) ri = -ri;
  let nr = sinE - rr, ni = -ri, dr = sinE + rr, di = ri;
  let dd = dr * dr + di * di;
  rc[3] = (nr * dr + ni * di) / dd;
  rc[4] = (ni * dr - nr * di) / dd;
  const er = m.epsRe * sinE, ei = m.epsIm * sinE;
  nr = er - rr; ni = ei - ri; dr = er + rr; di = ei + ri;
  dd = dr * dr + di * di;
  rc[5] = (nr * dr + ni * di) / dd;
  rc[6] = (ni * dr - nr * di) / dd;
}

/**
 * Linear gain (relative to an isotropic radiator fed the same power) at elevation Δ and azimuth φ, given as
 * sines and cosines. φ = 0 points along the wire towards end 1. Below the horizon over ground: 0.
 */
export function gainLinear(m: PreparedDipole, sinE: number, cosE: number, sinA: number, cosA: number): number {
  if (m.ground !== 'free-space' && sinE < 0) return 0;
  const k = m.k, H = m.H;
  const rx = cosE * cosA, rz = sinE;
  const l1 = m.legs[0], l2 = m.legs[1];
  // per-elevation values (feed-point phase, Fresnel coefficients) repeat across an azimuth sweep: memo them
  const rc = m.rowCache;
  if (rc[0] !== sinE) fillRow(m, sinE);
  const e0r = rc[1], e0i = rc[2];
  const ckh = m.cosKL, skh = m.sinKL;
  const l = H, kl = k * H, half = kl / 2;
  // a1 = k(q − 1)ℓ/2 for each leg, q = r̂·t̂; a horizontal leg and its image share q
  const a11 = half * (rx * l1.tx + rz * l1.tz - 1);
  const a12 = half * (rx * l2.tx + rz * l2.tz - 1);
  // a level wire seen broadside has the same a1 every call: keep the last cos/sin per leg
  const tc = m.trigCache;
  if (a11 !== tc[0]) { tc[0] = a11; tc[1] = Math.cos(a11); tc[2] = Math.sin(a11); }
  if (a12 === a11) { tc[3] = a12; tc[4] = tc[1]; tc[5] = tc[2]; } // mirror legs seen broadside
  else if (a12 !== tc[3]) { tc[3] = a12; tc[4] = Math.cos(a12); tc[5] = Math.sin(a12); }
  const c11 = tc[1], s11 = tc[2], c12 = tc[4], s12 = tc[5];
  // direct wire: N = Σ sign·t̂·∫
  legIntegral(kl, l, a11, c11, s11, e0r, e0i, ckh, skh);
  let nxr = l1.tx * accRe, nxi = l1.tx * accIm, nzr = l1.tz * accRe, nzi = l1.tz * accIm;
  legIntegral(kl, l, a12, c12, s12, e0r, e0i, ckh, skh);
  nxr -= l2.tx * accRe; nxi -= l2.tx * accIm; nzr -= l2.tz * accRe; nzi -= l2.tz * accIm;
  // θ̂ = (sinΔ cosφ, ·, −cosΔ), φ̂ = (−sinφ, cosφ, 0); t_y = 0
  let tRe = nxr * sinE * cosA - nzr * cosE;
  let tIm = nxi * sinE * cosA - nzi * cosE;
  let pRe = -nxr * sinA;
  let pIm = -nxi * sinA;
  if (m.ground !== 'free-space') {
    // image: mirrored path (t_z → −t_z, p_z → −h) carrying −I
    // image legs: a horizontal leg keeps its a1; mirror-symmetric legs share one value broadside
    let b1 = a11, cb1 = c11, sb1 = s11;
    if (l1.tz !== 0) {
      b1 = half * (rx * l1.tx - rz * l1.tz - 1);
      cb1 = Math.cos(b1);
      sb1 = Math.sin(b1);
    }
    legIntegral(kl, l, b1, cb1, sb1, e0r, -e0i, ckh, skh);
    let ixr = -l1.tx * accRe, ixi = -l1.tx * accIm, izr = l1.tz * accRe, izi = l1.tz * accIm;
    let b2 = a12, cb2 = c12, sb2 = s12;
    if (l2.tz !== 0) {
      b2 = half * (rx * l2.tx - rz * l2.tz - 1);
      if (b2 === b1) {
        cb2 = cb1;
        sb2 = sb1;
      } else {
        cb2 = Math.cos(b2);
        sb2 = Math.sin(b2);
      }
    }
    legIntegral(kl, l, b2, cb2, sb2, e0r, -e0i, ckh, skh);
    ixr += l2.tx * accRe; ixi += l2.tx * accIm; izr -= l2.tz * accRe; izi -= l2.tz * accIm;
    const itRe = ixr * sinE * cosA - izr * cosE;
    const itIm = ixi * sinE * cosA - izi * cosE;
    const ipRe = -ixr * sinA;
    const ipIm = -ixi * sinA;
    if (m.ground === 'perfect') {
      tRe += itRe; tIm += itIm; pRe += ipRe; pIm += ipIm;
    } else {
      const hRe = rc[3], hIm = rc[4], vRe = rc[5], vIm = rc[6];
      tRe += vRe * itRe - vIm * itIm;
      tIm += vRe * itIm + vIm * itRe;
      pRe -= hRe * ipRe - hIm * ipIm;
      pIm -= hRe * ipIm + hIm * ipRe;
    }
  }
  return (tRe * tRe + tIm * tIm + pRe * pRe + pIm * pIm) * m.gainScale;
}

export function gainLinearDeg(m: PreparedDipole, elevationDeg: number, azimuthDeg: number): number {
  const e = (elevationDeg * Math.PI) / 180;
  const a = (azimuthDeg * Math.PI) / 180;
  return gainLinear(m, Math.sin(e), Math.cos(e), Math.sin(a), Math.cos(a));
}
