import { describe, expect, it } from 'vitest';
import { generateDemoSite } from './demo-site';
import { evaluateSpot, planSite } from './index';
import { seededRandom } from './random';

const site = generateDemoSite({ supports: 24, random: seededRandom(5) });
const plan = planSite(site);

describe('evaluateSpot: the checks of one recorded spot', { timeout: 120_000 }, () => {
  it('gives the same clearances, level and score as planSite for every ranked candidate (one engine, two doors)', () => {
    let n = 0;
    for (const a of plan.antennas) {
      for (const c of a.ranked.slice(0, 3)) {
        const e = evaluateSpot(site, { stationId: c.stationId, band: c.band, shape: c.shape, supportIds: c.supportIds, geometryId: c.id });
        expect(e).not.toBeNull();
        expect(e!.candidate.clearances).toEqual(c.clearances);
        expect(e!.candidate.level).toBe(c.level);
        expect(e!.candidate.score).toBeCloseTo(c.score, 9);
        expect(e!.patternInput.freqMhz).toBeGreaterThan(0);
        n++;
      }
    }
    expect(n).toBeGreaterThan(3);
  });

  it('without a candidate id an inverted-V takes the best usable leg direction; a spot on a removed support cannot be built', () => {
    const iv = plan.antennas.flatMap((a) => a.ranked).find((c) => c.shape === 'inverted-v' && c.level !== 'blocked');
    expect(iv).toBeDefined();
    const e = evaluateSpot(site, { stationId: iv!.stationId, band: iv!.band, shape: 'inverted-v', supportIds: iv!.supportIds });
    expect(e!.candidate.level).not.toBe('blocked');
    expect(e!.candidate.score).toBeGreaterThanOrEqual(iv!.score - 1e-9);
    const gone = { ...site, supports: site.supports.filter((s) => s.id !== iv!.supportIds[0]) };
    expect(evaluateSpot(gone, { stationId: iv!.stationId, band: iv!.band, shape: 'inverted-v', supportIds: iv!.supportIds })).toBeNull();
  });
});
