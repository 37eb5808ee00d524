import { describe, expect, it } from 'vitest';
import { planSite, seededRandom } from '../../shared/plan';
import type { SiteFile } from '../../shared/schemas/site-file';

// Small random sites (seeded): a few trees and masts around the reference, one power line, one path, one
// operating position and two or three stations on short-dipole bands.
function smallSite(seed: number): SiteFile {
  const rnd = seededRandom(seed);
  const deg = (m: number) => m / 111_320; // metres → degrees of latitude, near enough for invented test data
  const ref = { lat: 45, lon: -93 };
  const pt = (e: number, n: number) => ({ lat: ref.lat + deg(n), lon: ref.lon + deg(e) / Math.cos((ref.lat * Math.PI) / 180) });
  const supports: SiteFile['supports'] = Array.from({ length: 5 + (seed % 3) }, (_, i) => {
    const mast = rnd() < 0.3;
    const h = mast ? 8 + rnd() * 4 : 9 + rnd() * 12;
    return { id: `${mast ? 'M' : 'T'}${i}`, kind: mast ? 'mast' : 'tree', ...pt(rnd() * 50, rnd() * 50), heightM: h, attachHeightM: mast ? h : h * 0.8 };
  });
  const bands = (['20m', '17m', '15m', '10m'] as const).filter(() => rnd() < 0.75).slice(0, 3);
  if (bands.length < 2) bands.push('10m', '15m');
  return {
    version: 1,
    reference: ref,
    ground: 'average',
    supports,
    hazards: [
      { id: 'L1', kind: 'power-line', points: [pt(-30, 30 + rnd() * 60), pt(90, 30 + rnd() * 60)], voltageKv: 7.2 },
      { id: 'P1', kind: 'path', points: [pt(-10, -5), pt(60, -5)] },
    ],
    operatingPositions: [{ id: 'OP', ...pt(25, 25) }],
    stations: bands.map((b, i) => ({ id: `S${i}`, bands: [b], powerW: 100, mode: i % 2 ? 'cw' : 'ssb' })),
    coax: [
      { id: 'C1', type: 'RG-8X', lengthM: 30 },
      { id: 'C2', type: 'RG-213', lengthM: 25 },
    ],
  };
}

describe('assignment on seeded random small sites', { timeout: 120_000 }, () => {
  it('branch and bound equals brute force over every candidate combination (12 sites)', () => {
    let compared = 0;
    for (let seed = 1; seed <= 12; seed++) {
      const site = smallSite(seed);
      const exact = planSite(site, { assignMethod: 'exact' });
      const brute = planSite(site, { assignMethod: 'brute-force' });
      expect(exact.assignment.exact).toBe(true);
      expect(exact.assignment.totalScore).toBeCloseTo(brute.assignment.totalScore, 9);
      compared++;
    }
    expect(compared).toBe(12);
  });

  it('offering one leg direction per inverted-V support loses nothing: equals brute force over every direction (8 sites)', () => {
    for (let seed = 40; seed < 48; seed++) {
      const site = smallSite(seed);
      site.stations = site.stations.slice(0, 2); // every leg direction makes brute force grow fast
      const exact = planSite(site, { assignMethod: 'exact' });
      const brute = planSite(site, { assignMethod: 'brute-force', keepAllLegDirections: true });
      expect(exact.assignment.totalScore).toBeCloseTo(brute.assignment.totalScore, 9);
    }
  });

  it('the heuristic never beats the proven optimum and stays feasible', () => {
    for (let seed = 20; seed < 26; seed++) {
      const site = smallSite(seed);
      const h = planSite(site, { assignMethod: 'heuristic' });
      const exact = planSite(site, { assignMethod: 'exact' });
      expect(h.assignment.totalScore).toBeLessThanOrEqual(exact.assignment.totalScore + 1e-9);
      for (const s of h.assignment.spots) if (s.candidate) expect(s.candidate.level).not.toBe('blocked');
    }
  });
});
