import { DEG, toDbi } from './db';
import { gainLinear, prepareDipole } from './model';
import { mainLobe } from './summary';
import { swr } from './swr';
import type { DipoleInput, PatternSummary } from './types';
import { modelNotes, OPERATOR_WINDOWS } from './windows';

/*
 * The straightforward reference the fast summary is checked against (tests and `npm run bench`):
 * the gain on a full 1° hemisphere grid (elevation 0…90°, azimuth 0…359°, 32 760 directions) for the ground
 * loss, the summary read off a brute broadside column at 0.1° (a 1° column alone is too coarse for the 3°-wide
 * lobes of a 6 m wire at 5 λ: parabolic interpolation of each lobe, linear interpolation of the half-power
 * crossings in dB, trapezoid window means), and the
 * feed impedance from the independent double-integral induced-EMF code at 3× its quadrature order.
 * Deliberately slow and simple; never used by the app.
 */
export function referenceSummary(input: DipoleInput): PatternSummary {
  const m = prepareDipole(input, 3, 'double-integral');
  const nE = 91;
  const grid: Float64Array[] = [];
  for (let i = 0; i < nE; i++) {
    const row = new Float64Array(360);
    const e = i * DEG;
    const se = Math.sin(e), ce = Math.cos(e);
    for (let j = 0; j < 360; j++) row[j] = gainLinear(m, se, ce, Math.sin(j * DEG), Math.cos(j * DEG));
    grid.push(row);
  }
  const STEP = 0.1;
  const nC = Math.round(90 / STEP);
  const col: number[] = [];
  for (let i = 0; i <= nC; i++) {
    const e = i * STEP * DEG;
    col.push(gainLinear(m, Math.sin(e), Math.cos(e), 1, 0));
  }
  const db = col.map(toDbi);
  const max = Math.max(...col), min = Math.min(...col);
  const flat = max - min <= 1e-6 * max;
  const lobes: { elevationDeg: number; gainDbi: number }[] = [];
  const nulls: { elevationDeg: number }[] = [];
  // the cut is symmetric about the zenith (geometry in the x–z plane), so sample 91° mirrors 89°
  const at = (i: number) => (i > nC ? db[2 * nC - i] : db[i]);
  const vertex = (i: number) => {
    const a = at(i - 1), b = at(i), c = at(i + 1);
    const den = a - 2 * b + c;
    const d = den === 0 ? 0 : (0.5 * (a - c)) / den;
    return { x: (i + d) * STEP, y: b - 0.25 * (a - c) * d };
  };
  if (flat) lobes.push({ elevationDeg: 0, gainDbi: db[0] });
  else {
    if (col[0] > col[1]) lobes.push({ elevationDeg: 0, gainDbi: db[0] });
    for (let i = 1; i <= nC; i++) {
      const next = i === nC ? col[nC - 1] : col[i + 1];
      if (col[i] >= col[i - 1] && col[i] > next) {
        const v = vertex(i);
        lobes.push({ elevationDeg: Math.min(90, v.x), gainDbi: v.y });
      } else if (i < nC && col[i] <= col[i - 1] && col[i] < next) nulls.push({ elevationDeg: vertex(i).x });
    }
  }
  const main = mainLobe(lobes, (l) => l.gainDbi);
  const halfDb = main.gainDbi + 10 * Math.log10(0.5);
  let lowDeg = 0, highDeg = 90;
  if (!flat) {
    const p = Math.round(main.elevationDeg / STEP);
    for (let i = Math.min(p, nC); i > 0; i--) {
      if (db[i - 1] < halfDb && db[i] >= halfDb) {
        lowDeg = (i - 1 + (halfDb - db[i - 1]) / (db[i] - db[i - 1])) * STEP;
        break;
      }
    }
    for (let i = Math.max(p, 0); i < nC; i++) {
      if (db[i + 1] < halfDb && db[i] >= halfDb) {
        highDeg = (i + (db[i] - halfDb) / (db[i] - db[i + 1])) * STEP;
        break;
      }
    }
  }
  const windows = OPERATOR_WINDOWS.map((w) => {
    let s = 0;
    const a = Math.round(w.fromDeg / STEP), b = Math.round(w.toDeg / STEP);
    for (let i = a; i < b; i++) s += (col[i] + col[i + 1]) / 2;
    return { id: w.id, fromDeg: w.fromDeg, toDeg: w.toDeg, meanGainDbi: toDbi(s / (b - a)) };
  });
  let groundLossDb = 0;
  if (m.ground === 'real') {
    // (1/4π) ∫∫ G cosΔ dΔ dφ, trapezoid in Δ, rectangle in φ (periodic)
    let s = 0;
    for (let i = 0; i < nE; i++) {
      let row = 0;
      for (let j = 0; j < 360; j++) row += grid[i][j];
      const wgt = i === 0 || i === 90 ? 0.5 : 1;
      s += wgt * row * Math.cos(i * DEG);
    }
    groundLossDb = -10 * Math.log10((s * DEG * DEG) / (4 * Math.PI));
  }
  return {
    peakGainDbi: main.gainDbi,
    takeoffDeg: main.elevationDeg,
    halfPower: { lowDeg, highDeg },
    lobes,
    nulls,
    windows,
    feed: { ...m.feed },
    swr50: swr(m.feed.resistanceOhm, m.feed.reactanceOhm, 50),
    groundLossDb,
    heightWavelengths: input.heightM / m.lambdaM,
    modelNotes: modelNotes({ ground: m.ground, heightWavelengths: m.input.heightM / m.lambdaM, lowestWavelengths: m.lowestM / m.lambdaM, lengthWavelengths: (2 * m.H) / m.lambdaM }),
  };
}
