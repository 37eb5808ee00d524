import type { Complex } from './permittivity';

/*
 * Plane-wave reflection from flat ground at grazing angle ψ (elevation above the ground plane), for the
 * complex relative permittivity εc of the ground:
 *   Γh = (sinψ − √(εc − cos²ψ)) / (sinψ + √(εc − cos²ψ))           horizontal polarisation (E parallel to ground)
 *   Γv = (εc·sinψ − √(εc − cos²ψ)) / (εc·sinψ + √(εc − cos²ψ))     vertical polarisation (E in the plane of incidence)
 * A perfect conductor gives Γh = −1, Γv = +1 (textbook Fresnel formulas, from memory; checked against
 * worked values in tests/reference/physics-ground.test.ts).
 */

export type FresnelPair = { hRe: number; hIm: number; vRe: number; vIm: number };

/** Principal complex square root (non-negative real part). */
export function csqrt(re: number, im: number): Complex {
  const m = Math.sqrt(re * re + im * im);
  const r = Math.sqrt((m + re) / 2);
  const i = Math.sqrt(Math.max(0, (m - re) / 2));
  return { re: r, im: im < 0 ? -i : i };
}

/** Fresnel coefficients, written into `out` (no allocation: this runs inside the pattern loops). */
export function fresnelInto(epsRe: number, epsIm: number, sinPsi: number, out: FresnelPair): FresnelPair {
  const cos2 = 1 - sinPsi * sinPsi;
  const root = csqrt(epsRe - cos2, epsIm);
  // Γh
  let nr = sinPsi - root.re, ni = -root.im, dr = sinPsi + root.re, di = root.im;
  let dd = dr * dr + di * di;
  out.hRe = (nr * dr + ni * di) / dd;
  out.hIm = (ni * dr - nr * di) / dd;
  // Γv
  const er = epsRe * sinPsi, ei = epsIm * sinPsi;
  nr = er - root.re; ni = ei - root.im; dr = er + root.re; di = ei + root.im;
  dd = dr * dr + di * di;
  out.vRe = (nr * dr + ni * di) / dd;
  out.vIm = (ni * dr - nr * di) / dd;
  return out;
}

/** Fresnel coefficients at grazing angle ψ in degrees. */
export function fresnelCoefficients(eps: Complex, grazingDeg: number): { h: Complex; v: Complex } {
  const p = fresnelInto(eps.re, eps.im, Math.sin((grazingDeg * Math.PI) / 180), { hRe: 0, hIm: 0, vRe: 0, vIm: 0 });
  return { h: { re: p.hRe, im: p.hIm }, v: { re: p.vRe, im: p.vIm } };
}
