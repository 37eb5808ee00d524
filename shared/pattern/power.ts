import { gaussLegendre } from './gauss';
import { gainLinear, type PreparedDipole } from './model';

/*
 * Fraction of the feed power that leaves as radiation: (1/4π)∮ G dΩ, with dΩ = d(sinΔ)·dφ. Over ground
 * only the upper hemisphere counts (sin Δ from 0 to 1): what is missing went into the ground. Gauss–Legendre
 * in sin Δ and in φ, the orders growing with height and wire length; the geometry's mirror symmetries
 * (y → −y always, x → −x for symmetric legs) shrink the azimuth range.
 */
export function radiatedFraction(m: PreparedDipole, scale = 1): number {
  const hL = m.input.heightM / m.lambdaM;
  const lL = (2 * m.H) / m.lambdaM;
  const freeSpace = m.ground === 'free-space';
  const ru = gaussLegendre(Math.ceil((10 + 8 * hL * (freeSpace ? 0 : 1) + 4 * lL) * scale));
  const phiSpan = m.symmetric ? Math.PI / 2 : Math.PI;
  const rp = gaussLegendre(Math.ceil((6 + 6 * lL) * scale * (m.symmetric ? 1 : 2)));
  const uLo = freeSpace ? -1 : 0;
  const uHalf = (1 - uLo) / 2;
  const uMid = (1 + uLo) / 2;
  let total = 0;
  for (let i = 0; i < ru.x.length; i++) {
    const u = uMid + uHalf * ru.x[i];
    const c = Math.sqrt(Math.max(0, 1 - u * u));
    let row = 0;
    for (let j = 0; j < rp.x.length; j++) {
      const phi = (phiSpan / 2) * (1 + rp.x[j]);
      row += rp.w[j] * gainLinear(m, u, c, Math.sin(phi), Math.cos(phi));
    }
    total += ru.w[i] * row * (phiSpan / 2);
  }
  total *= uHalf;
  // the integral covered phiSpan; the full circle is 2π
  return (total * (2 * Math.PI)) / phiSpan / (4 * Math.PI);
}
