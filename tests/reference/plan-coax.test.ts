import { describe, expect, it } from 'vitest';
import { COAX_LOSS_DB_PER_100FT_AT_30MHZ, matchedLossDb, planCoaxRun, swrExtraLossDb } from '../../shared/coax';

const FT100 = 30.48;

describe('coax matched loss (ARRL General Class License Manual Table 6-1, 30 MHz) and √f scaling', () => {
  it.each([
    ['RG-8', 1.08],
    ['RG-213', 1.08],
    ['RG-8X', 1.96],
    ['RG-58', 2.47],
    ['RG-174', 4.56],
  ] as const)('100 ft of %s at 30 MHz loses %s dB (ARRL Table 6-1)', (type, db) => {
    expect(matchedLossDb(type, 30, FT100)).toBeCloseTo(db, 9);
  });

  it('loss scales as √f below 100 MHz (textbook skin effect): 7.5 MHz is half the 30 MHz loss', () => {
    expect(matchedLossDb('RG-8X', 7.5, FT100)).toBeCloseTo(0.98, 9);
    expect(matchedLossDb('RG-213', 14.2, 50)! / matchedLossDb('RG-213', 28.4, 50)!).toBeCloseTo(Math.SQRT1_2, 9);
  });

  it('a type with no table row reports unknown loss instead of a guess (LMR-400)', () => {
    expect(COAX_LOSS_DB_PER_100FT_AT_30MHZ['LMR-400']).toBeNull();
    expect(matchedLossDb('LMR-400', 14, 30)).toBeNull();
  });
});

describe('additional loss from SWR (ARRL Antenna Book formula, from memory)', () => {
  it('zero on a matched line and on a lossless line', () => {
    expect(swrExtraLossDb(1.5, 1)).toBeCloseTo(0, 12);
    expect(swrExtraLossDb(0, 4)).toBeCloseTo(0, 12);
  });
  it('1 dB matched loss at SWR 3 adds about 0.5 dB (ARRL Antenna Book chart, from memory)', () => {
    expect(swrExtraLossDb(1, 3)).toBeCloseTo(0.504, 2);
  });
  it('grows with SWR', () => {
    expect(swrExtraLossDb(1, 2)).toBeLessThan(swrExtraLossDb(1, 3));
  });
});

describe('coax run from feed point to operating position (ground route + drop + slack)', () => {
  const ops = [
    { id: 'far', at: { eastM: 100, northM: 0 } },
    { id: 'near', at: { eastM: 0, northM: 20 } },
  ];
  it('goes to the nearest position; run = ground + drop + max(2 m, 10 %)', () => {
    const run = planCoaxRun({ feedAt: { eastM: 0, northM: 0 }, feedHeightM: 10, freqMhz: 7.15, swr: 1.3, operatingPositions: ops, inventory: [] })!;
    expect(run.operatingPositionId).toBe('near');
    expect(run.runM).toBeCloseTo(33, 9);
    expect(run.best).toBeNull();
  });
  it('lists the pieces that reach, best loss first, and joins two when none reaches alone', () => {
    const inv = [
      { id: 'c1', type: 'RG-58', lengthM: 40 },
      { id: 'c2', type: 'RG-213', lengthM: 35 },
      { id: 'c3', type: 'RG-8X', lengthM: 20 },
    ] as const;
    const run = planCoaxRun({ feedAt: { eastM: 0, northM: 0 }, feedHeightM: 10, freqMhz: 7.15, swr: 1.3, operatingPositions: ops, inventory: [...inv] })!;
    expect(run.reachingPieceIds).toEqual(['c2', 'c1']);
    expect(run.best?.pieceIds).toEqual(['c2']);
    const longRun = planCoaxRun({ feedAt: { eastM: 0, northM: -30 }, feedHeightM: 10, freqMhz: 7.15, swr: 1.3, operatingPositions: ops, inventory: [...inv] })!;
    expect(longRun.reachingPieceIds).toEqual([]);
    expect(longRun.best?.pieceIds.length).toBe(2);
  });
  it('no operating position: no run', () => {
    expect(planCoaxRun({ feedAt: { eastM: 0, northM: 0 }, feedHeightM: 10, freqMhz: 7, swr: 1, operatingPositions: [], inventory: [] })).toBeNull();
  });
});
