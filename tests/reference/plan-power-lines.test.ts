import { describe, expect, it } from 'vitest';
import {
  type AntennaFootprint,
  DEFAULT_CLEARANCE_OPTIONS,
  FT_TO_M,
  OSHA_TABLE_A,
  type RecordedHazard,
  SAFETY_CAUTION,
  T0B06_MIN_GAP_M,
  mastRaisingClearance,
  oshaTableAClearanceM,
  powerLineClearances,
  powerLineFallClearance,
} from '../../shared/clearance';

const opts = DEFAULT_CLEARANCE_OPTIONS;

/** A 9 m mast at the origin carrying an inverted-V whose legs can swing 7 m. Fall reach: 9 m. */
function mastFootprint(heightM = 9, swingReachM = 7): AntennaFootprint {
  return {
    supports: [{ supportId: 'M1', kind: 'mast', at: { eastM: 0, northM: 0 }, heightM }],
    wire: [[{ eastM: -6, northM: 0 }, { eastM: 6, northM: 0 }]],
    swingReachM,
  };
}

/** A straight north–south line at eastM = x. */
function lineAt(x: number, voltageKv?: number): RecordedHazard {
  return {
    id: 'L1',
    kind: 'power-line',
    shape: { points: [{ eastM: x, northM: -100 }, { eastM: x, northM: 100 }], closed: false },
    voltageKv,
  };
}

describe('power-line fall clearance (NCVEC Technician pool T0B06: 10 ft beyond anything that can fall)', () => {
  it('the T0B06 gap is 10 ft = 3.048 m (NCVEC pool 2022–2026, T0B06)', () => {
    expect(T0B06_MIN_GAP_M).toBeCloseTo(3.048, 6);
  });

  it('a line exactly at fall radius + 10 ft meets the rule but is inside the 50 % margin: needs review (boundary as documented)', () => {
    const r = powerLineFallClearance(mastFootprint(), lineAt(9 + 3.048), opts);
    expect(r.requiredM).toBeCloseTo(12.048, 9);
    expect(r.level).toBe('needs-review');
    expect(r.source).toMatch(/T0B06/);
  });

  it('a line 1 cm inside fall radius + 10 ft is blocked (T0B06)', () => {
    const r = powerLineFallClearance(mastFootprint(), lineAt(9 + 3.048 - 0.01), opts);
    expect(r.level).toBe('blocked');
    expect(r.message).toMatch(/no one can approve/);
  });

  it('the review margin ends at 1.5 × the required distance: just beyond is clear (margin default 50 %)', () => {
    expect(powerLineFallClearance(mastFootprint(), lineAt(12.048 * 1.5 - 0.01), opts).level).toBe('needs-review');
    expect(powerLineFallClearance(mastFootprint(), lineAt(12.048 * 1.5 + 0.01), opts).level).toBe('clear');
    expect(powerLineFallClearance(mastFootprint(), lineAt(14), { reviewMarginFraction: 0.1 }).level).toBe('clear');
  });

  it('the wire swinging from its remaining end counts when it reaches further than the support (T0B06 "no part of it")', () => {
    const fp = mastFootprint(6, 20); // a short mast with a long wire
    expect(powerLineFallClearance(fp, lineAt(20 + 3.048 - 0.01), opts).level).toBe('blocked');
    expect(powerLineFallClearance(fp, lineAt(20 + 3.048 - 0.01), opts).requiredM).toBeCloseTo(23.048, 6);
  });

  it('the nearest support decides on a flat-top span between two supports', () => {
    const fp: AntennaFootprint = {
      supports: [
        { supportId: 'T1', kind: 'tree', at: { eastM: 0, northM: 0 }, heightM: 15 },
        { supportId: 'T2', kind: 'tree', at: { eastM: 30, northM: 0 }, heightM: 12 },
      ],
      wire: [[{ eastM: 5, northM: 0 }, { eastM: 25, northM: 0 }]],
      swingReachM: 30,
    };
    const r = powerLineFallClearance(fp, lineAt(60), opts); // 30 m from T2, reach 30 m
    expect(r.level).toBe('blocked');
    expect(r.message).toMatch(/T2/);
  });

  it('every result carries the caution line (planning estimates; treat every line as energised)', () => {
    const all = powerLineClearances(mastFootprint(), [lineAt(40, 12.47)], opts);
    expect(all.length).toBe(2);
    for (const r of all) expect(r.caution).toBe(SAFETY_CAUTION);
    expect(SAFETY_CAUTION).toMatch(/energised/);
    expect(SAFETY_CAUTION).toMatch(/utility, local codes and licensed practice decide/);
  });
});

describe('mast raising near lines (OSHA 29 CFR 1926.1408 Table A)', () => {
  it.each([
    [0.24, 10], // 120/240 V service drop
    [12.47, 10], // common distribution voltage (Short, Electric Power Distribution Handbook)
    [50, 10],
    [50.1, 15],
    [200, 15],
    [230, 20],
    [345, 20],
    [500, 25],
    [765, 45],
  ])('Table A: %s kV needs %s ft (OSHA 1926.1408 Table A)', (kv, ft) => {
    expect(oshaTableAClearanceM(kv)).toBeCloseTo(ft * FT_TO_M, 9);
  });

  it('Table A rows are the six published ones, 10/15/20/25/35/45 ft (OSHA 1926.1408 Table A)', () => {
    expect(OSHA_TABLE_A.map((r) => [r.upToKv, r.clearanceFt])).toEqual([
      [50, 10],
      [200, 15],
      [350, 20],
      [500, 25],
      [750, 35],
      [1000, 45],
    ]);
  });

  it('above 1000 kV Table A leaves the distance to the utility: never clear (OSHA 1926.1408 Table A)', () => {
    expect(oshaTableAClearanceM(1100)).toBeNull();
    const r = mastRaisingClearance(mastFootprint().supports[0], lineAt(500, 1100), opts);
    expect(r.level).toBe('needs-review');
    expect(r.message).toMatch(/utility/);
  });

  it('a line with no voltage is planned as transmission (45 ft row) and is never called clear (issue 4)', () => {
    expect(oshaTableAClearanceM(undefined)).toBeCloseTo(45 * FT_TO_M, 9);
    const far = mastRaisingClearance(mastFootprint().supports[0], lineAt(500), opts);
    expect(far.level).toBe('needs-review');
    expect(far.message).toMatch(/voltage not recorded/);
    const near = mastRaisingClearance(mastFootprint().supports[0], lineAt(9 + 45 * FT_TO_M - 0.01), opts);
    expect(near.level).toBe('blocked');
  });

  it('a 9 m mast 12.47 kV line: mast height + 10 ft, exact edge meets the rule (OSHA Table A; boundary as documented)', () => {
    const mast = mastFootprint().supports[0];
    expect(mastRaisingClearance(mast, lineAt(9 + 3.048, 12.47), opts).level).toBe('needs-review');
    expect(mastRaisingClearance(mast, lineAt(9 + 3.048 - 0.01, 12.47), opts).level).toBe('blocked');
    expect(mastRaisingClearance(mast, lineAt(100, 12.47), opts).level).toBe('clear');
  });

  it('trees get no mast-raising result (nothing is raised); masts get one per line', () => {
    const fp: AntennaFootprint = {
      supports: [{ supportId: 'T1', kind: 'tree', at: { eastM: 0, northM: 0 }, heightM: 15 }],
      wire: [],
      swingReachM: 10,
    };
    expect(powerLineClearances(fp, [lineAt(100, 7.2)], opts).map((r) => r.kind)).toEqual(['power-line']);
  });
});
