import type { SiteFile } from '../schemas/site-file';
import { latLonFromPlane } from './physics';
import type { RandomSource } from './random';

/*
 * A generated, invented park for demonstrations and benchmarks: "Fernwick Commons" (no real place), a
 * square of meadow and woodland that grows with the number of supports (one support per ~450 m²), with a
 * distribution line along its north edge, a service drop of unrecorded voltage, a road, a path, a car park,
 * a pavilion and a pond. Six invented stations on six bands. The random source is injected: the same seed
 * gives the same file.
 */
export type DemoSiteOptions = { supports: number; random: RandomSource; reference?: { lat: number; lon: number } };

export const DEMO_REFERENCE = { lat: 45.1234, lon: -93.4567 };

export function generateDemoSite(opts: DemoSiteOptions): SiteFile {
  const n = Math.floor(opts.supports);
  if (!(n >= 1 && n <= 5000)) throw new RangeError('supports must be between 1 and 5000');
  const rnd = opts.random;
  const ref = opts.reference ?? DEMO_REFERENCE;
  const side = 150 * Math.sqrt(Math.max(n, 50) / 50);
  const at = (eastM: number, northM: number) => {
    const p = latLonFromPlane(ref, { eastM, northM });
    return { lat: Math.round(p.lat * 1e7) / 1e7, lon: Math.round(p.lon * 1e7) / 1e7 };
  };
  const round1 = (x: number) => Math.round(x * 10) / 10;
  const supports: SiteFile['supports'] = [];
  const placed: { e: number; n: number }[] = [];
  let tries = 0;
  while (supports.length < n && tries < n * 50) {
    tries++;
    const e = rnd() * side;
    const no = 12 + rnd() * (side - 24); // keep off the road (south) and the line corridor (north edge)
    if (placed.some((p) => Math.hypot(p.e - e, p.n - no) < 3)) continue;
    placed.push({ e, n: no });
    const r = rnd();
    const i = supports.length + 1;
    if (r < 0.15) {
      const h = round1(6 + rnd() * 6);
      supports.push({ id: `M${i}`, kind: 'mast', ...at(e, no), heightM: h, attachHeightM: h });
    } else if (r < 0.2) {
      const h = round1(5 + rnd() * 10);
      supports.push({ id: `B${i}`, kind: 'structure', ...at(e, no), heightM: h, attachHeightM: round1(h * 0.9) });
    } else {
      const h = round1(8 + rnd() * 17);
      supports.push({ id: `T${i}`, kind: 'tree', ...at(e, no), heightM: h, attachHeightM: round1(h * (0.6 + rnd() * 0.3)) });
    }
  }
  const hazards: SiteFile['hazards'] = [
    { id: 'line-north', kind: 'power-line', points: [at(-20, side + 6), at(side / 2, side + 4), at(side + 20, side + 8)], heightM: 10, voltageKv: 12.47 },
    { id: 'drop-pavilion', kind: 'power-line', points: [at(side * 0.3, side + 4), at(side * 0.32, side * 0.8)], heightM: 5 },
    { id: 'road-south', kind: 'road', points: [at(-20, 4), at(side + 20, 4)] },
    { id: 'path-loop', kind: 'path', points: [at(0, side * 0.4), at(side * 0.35, side * 0.5), at(side * 0.7, side * 0.45), at(side, side * 0.55)] },
    { id: 'car-park', kind: 'parking', points: [at(side * 0.8, 6), at(side, 6), at(side, 30), at(side * 0.8, 30)] },
    { id: 'pavilion', kind: 'building', points: [at(side * 0.3, side * 0.78), at(side * 0.36, side * 0.78), at(side * 0.36, side * 0.84), at(side * 0.3, side * 0.84)], heightM: 5 },
    { id: 'pond', kind: 'water', points: [at(side * 0.1, side * 0.1), at(side * 0.2, side * 0.1), at(side * 0.2, side * 0.2), at(side * 0.1, side * 0.2)] },
  ];
  return {
    version: 1,
    name: `Fernwick Commons (invented demo park, ${n} supports)`,
    reference: ref,
    ground: 'average',
    supports,
    hazards,
    operatingPositions: [
      { id: 'tent-east', ...at(side * 0.6, side * 0.3) },
      { id: 'tent-west', ...at(side * 0.25, side * 0.65) },
    ],
    stations: [
      { id: 'night-80', bands: ['80m'], powerW: 100, mode: 'ssb' },
      { id: 'main-40', bands: ['40m'], powerW: 100, mode: 'cw' },
      { id: 'dx-20', bands: ['20m'], powerW: 500, mode: 'ssb', purpose: 'long-distance' },
      { id: 'digi-17', bands: ['17m'], powerW: 50, mode: 'digital' },
      { id: 'phone-15', bands: ['15m'], powerW: 100, mode: 'ssb' },
      { id: 'novice-10', bands: ['10m'], powerW: 100, mode: 'ssb' },
    ],
    coax: [
      { id: 'C1', type: 'RG-213', lengthM: 30 },
      { id: 'C2', type: 'RG-213', lengthM: 45 },
      { id: 'C3', type: 'RG-8X', lengthM: 30 },
      { id: 'C4', type: 'RG-8X', lengthM: 23 },
      { id: 'C5', type: 'RG-8X', lengthM: 15 },
      { id: 'C6', type: 'RG-58', lengthM: 15 },
      { id: 'C7', type: 'RG-58', lengthM: 30 },
      { id: 'C8', type: 'RG-213', lengthM: 60 },
    ],
  };
}
