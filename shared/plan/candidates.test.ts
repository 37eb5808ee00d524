import { describe, expect, it } from 'vitest';
import { planeDistanceM } from '../clearance/planar';
import { allPairs, bandSpec, flatTopBetween, invertedVsAt, nearbyPairs } from './candidates';
import { DEFAULT_PLAN_OPTIONS as opts } from './options';
import { seededRandom } from './random';
import type { ModelSupport } from './site-model';

const ground = { kind: 'real', sigmaSPerM: 0.005, epsR: 13 } as const;
const tree = (id: string, eastM: number, attachHeightM: number, northM = 0): ModelSupport => ({
  id,
  kind: 'tree',
  at: { eastM, northM },
  heightM: attachHeightM + 3,
  attachHeightM,
  maxEnds: 2,
});

describe('flat-top candidates', () => {
  const spec = bandSpec('20m', 14.175, opts);
  it('the wire is the practical half-wave cut, 468/f ft (US Technician pool T9A09): 33.02 ft at 14.175 MHz', () => {
    expect(spec.wireLengthM / 0.3048).toBeCloseTo(33.02, 1);
  });

  it('a span must fit wire + 2 insulators + the minimum rope each end, and not exceed the maximum rope', () => {
    const min = spec.wireLengthM + 2 * opts.insulatorM + 2 * opts.minRopeM;
    expect(flatTopBetween(tree('A', 0, 12), tree('B', min, 12), spec, ground, opts)?.ropeEachEndM).toBeCloseTo(opts.minRopeM, 9);
    expect(flatTopBetween(tree('A', 0, 12), tree('B', min - 0.01, 12), spec, ground, opts)).toBeNull();
    const max = spec.wireLengthM + 2 * opts.insulatorM + 2 * opts.maxRopeM;
    expect(flatTopBetween(tree('A', 0, 12), tree('B', max, 12), spec, ground, opts)).not.toBeNull();
    expect(flatTopBetween(tree('A', 0, 12), tree('B', max + 0.01, 12), spec, ground, opts)).toBeNull();
  });

  it('sag lowers the feed point below the attachments; heights in λ; broadside is square to the wire', () => {
    const g = flatTopBetween(tree('A', 0, 12), tree('B', 20, 12), spec, ground, opts)!;
    expect(g.sagM).toBeGreaterThan(0);
    expect(g.feedHeightM).toBeCloseTo(12 - g.sagM!, 9);
    expect(g.endHeightsM[0]).toBeGreaterThan(g.feedHeightM);
    expect(g.heightWavelengths).toBeCloseTo(g.feedHeightM / (299.792458 / 14.175), 9);
    expect(g.wireAzimuthDeg).toBeCloseTo(90, 9); // A→B is due east
    expect(g.broadsideDeg).toEqual([0, 180]);
    expect(g.swingReachM).toBeCloseTo(20, 9);
  });

  it('a span whose sagged wire would come below the minimum wire height is not offered', () => {
    expect(flatTopBetween(tree('A', 0, 3.05), tree('B', 20, 3.05), spec, ground, opts)).toBeNull();
  });
});

describe('inverted-V candidates', () => {
  it('ends hang (L/2)·cos(apex/2) below the apex: 40 m dipole at 120° from a 10 m apex ends near 5 m', () => {
    const spec = bandSpec('40m', 7.15, opts);
    const vs = invertedVsAt(tree('A', 0, 10), spec, ground, opts);
    expect(vs).toHaveLength(opts.invertedVAzimuthsDeg.length);
    expect(vs[0].endHeightsM[0]).toBeCloseTo(10 - (spec.wireLengthM / 2) * Math.cos(Math.PI / 3), 9);
    expect(invertedVsAt(tree('A', 0, 7), spec, ground, opts)).toEqual([]); // ends would be below 3 m
  });
});

describe('spatial pruning', () => {
  it('the grid finds exactly the pairs within the longest span that the every-pair scan finds', () => {
    const rnd = seededRandom(9);
    const supports = Array.from({ length: 300 }, (_, i) => tree(`T${i}`, rnd() * 400, 10, rnd() * 300));
    const maxSpan = 57;
    const brute = allPairs(supports.length).filter(([i, j]) => planeDistanceM(supports[i].at, supports[j].at) <= maxSpan);
    expect(nearbyPairs(supports, maxSpan)).toEqual(brute);
  });
});
