import { describe, expect, it } from 'vitest';
import { bandSpec, flatTopBetween, invertedVsAt, nearbyPairs } from './candidates';
import { generateDemoSite } from './demo-site';
import { evaluateCandidate } from './evaluate';
import { resolvePlanOptions } from './options';
import { freeSpaceAzimuthGainsDbi, patternSummary } from './physics';
import { seededRandom } from './random';
import { screenCandidate } from './screen';
import { buildSiteModel } from './site-model';
import { makeCoaxChooser } from '../coax/coax-run';

describe('screening agrees with the full evaluation', { timeout: 120_000 }, () => {
  it('same level and score for every candidate of a generated park, every band (the fast path is not a second opinion)', () => {
    const site = generateDemoSite({ supports: 30, random: seededRandom(11) });
    site.stations[0].mode = 'fm'; // a heavy duty cycle so that some exposure results need review
    site.stations[0].powerW = 1500;
    const model = buildSiteModel(site);
    const opts = resolvePlanOptions();
    let compared = 0;
    let notClear = 0;
    for (const need of model.needs) {
      const spec = bandSpec(need.band, need.freqMhz, opts);
      const geoms = [
        ...nearbyPairs(model.supports, spec.maxSpanM).flatMap(([i, j]) => flatTopBetween(model.supports[i], model.supports[j], spec, model.ground, opts) ?? []),
        ...model.supports.flatMap((s) => invertedVsAt(s, spec, model.ground, opts)),
      ];
      const chooser = makeCoaxChooser(model.coax, need.freqMhz);
      for (const g of geoms) {
        const pattern = patternSummary(g.patternInput);
        const { ground: _g, ...rest } = g.patternInput;
        const az = freeSpaceAzimuthGainsDbi({ ...rest, heightM: 10, endHeightsM: undefined });
        const full = evaluateCandidate(g, pattern, az, need, model, opts, chooser);
        const fast = screenCandidate(g, pattern, az, need, model, opts, chooser);
        expect(fast.level).toBe(full.level);
        expect(fast.score).toBeCloseTo(full.score, 12);
        expect(fast.reviews).toBe(full.clearances.filter((c) => c.level === 'needs-review').length);
        compared++;
        if (full.level !== 'clear') notClear++;
      }
    }
    expect(compared).toBeGreaterThan(500);
    expect(notClear).toBeGreaterThan(50);
  });
});
