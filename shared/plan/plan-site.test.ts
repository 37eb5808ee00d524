import { describe, expect, it } from 'vitest';
import { SAFETY_CAUTION } from '../clearance/cautions';
import { generateDemoSite } from './demo-site';
import { PlanInputError, planSite } from './index';
import { seededRandom } from './random';
import type { SiteFile } from '../schemas/site-file';

const site = generateDemoSite({ supports: 40, random: seededRandom(3) });
const result = planSite(site);

describe('planSite on a generated park', { timeout: 120_000 }, () => {
  it('is deterministic: the same file gives the same result', () => {
    expect(JSON.stringify(planSite(site))).toBe(JSON.stringify(result));
    expect(JSON.stringify(generateDemoSite({ supports: 40, random: seededRandom(3) }))).toBe(JSON.stringify(site));
  });

  it('plans one antenna per station band and carries the cautions on every clearance', () => {
    expect(result.antennas.map((a) => a.need.key)).toEqual(site.stations.flatMap((s) => s.bands.map((b) => `${s.id}:${b}`)));
    expect(result.caution).toBe(SAFETY_CAUTION);
    for (const a of result.antennas) for (const c of a.ranked) for (const r of c.clearances) expect(r.caution).toBe(SAFETY_CAUTION);
    for (const r of result.assignment.separations) expect(r.caution).toBe(SAFETY_CAUTION);
  });

  it('ranks usable candidates best first and explains each in plain lines ("0.48 λ high, takeoff 29°, 12 m of RG-8X, 0.4 dB")', () => {
    for (const a of result.antennas) {
      const scores = a.ranked.map((c) => c.score);
      expect([...scores].sort((x, y) => y - x)).toEqual(scores);
      for (const c of a.ranked) {
        expect(c.summary).toMatch(/^\d+\.\d\d λ high, takeoff \d+°, \d+ m of [A-Z0-9+-]+, \d+\.\d dB$/);
        expect(c.explanation.length).toBeGreaterThanOrEqual(3);
      }
    }
  });

  it('the chosen spots use no blocked candidate, overload no support and keep the minimum separation', () => {
    const ends = new Map<string, number>();
    for (const s of result.assignment.spots) {
      expect(s.candidate).not.toBeNull();
      expect(s.candidate!.level).not.toBe('blocked');
      for (const id of s.candidate!.supportIds) ends.set(id, (ends.get(id) ?? 0) + 1);
    }
    for (const [id, used] of ends) {
      const sup = site.supports.find((x) => x.id === id)!;
      expect(used).toBeLessThanOrEqual(sup.maxEnds ?? (sup.kind === 'mast' ? 1 : 2));
    }
    const n = result.assignment.spots.length;
    expect(result.assignment.separations).toHaveLength((n * (n - 1)) / 2);
    for (const r of result.assignment.separations) expect(r.wavelengths).toBeGreaterThanOrEqual(0.5);
    expect(result.assignment.exact).toBe(true);
  });

  it('gives each coax piece to at most one antenna', () => {
    const pieces = result.assignment.spots.flatMap((s) => s.coaxPieceIds);
    expect(new Set(pieces).size).toBe(pieces.length);
  });

  it('the unpruned, uncached reference proposes exactly the same candidates', () => {
    const ref = planSite(site, { pruneAndCache: false });
    expect(JSON.stringify(ref.antennas)).toBe(JSON.stringify(result.antennas));
    expect(ref.assignment.totalScore).toBeCloseTo(result.assignment.totalScore, 9);
    expect(ref.stats.pairsConsidered).toBe((40 * 39) / 2);
    expect(result.stats.pairsConsidered).toBeLessThan(ref.stats.pairsConsidered);
    expect(result.stats.patternCacheHits).toBeGreaterThan(0);
  });

  it('can plan one station only', () => {
    const one = planSite(site, { stationId: 'main-40' });
    expect(one.antennas.map((a) => a.need.key)).toEqual(['main-40:40m']);
    expect(() => planSite(site, { stationId: 'nobody' })).toThrow(/not in the site file/);
  });

  it('beyond 8 antennas the heuristic places them all within the same rules', () => {
    const many = { ...site, stations: site.stations.map((s, i) => ({ ...s, bands: i < 4 ? [s.bands[0], '6m' as const].slice(0, i % 2 ? 1 : 2) : s.bands })) };
    many.stations.push({ id: 'extra-10', bands: ['10m', '12m'], powerW: 100, mode: 'cw' }, { id: 'extra-30', bands: ['30m'], powerW: 100, mode: 'cw' });
    const r = planSite(many);
    expect(r.assignment.spots.length).toBeGreaterThan(8);
    expect(r.assignment.method).toBe('greedy-local');
    expect(r.assignment.exact).toBe(false);
    for (const sp of r.assignment.spots) if (sp.candidate) expect(sp.candidate.level).not.toBe('blocked');
    for (const sep of r.assignment.separations) expect(sep.level).not.toBe('blocked');
  });

  it('an unknown ground class is an error naming the field', () => {
    // A caller that skips the schema (which already refuses it) still gets the field named.
    const bad = { ...site, ground: 'swamp' } as unknown as SiteFile;
    expect(() => planSite(bad)).toThrow(PlanInputError);
    expect(() => planSite(bad)).toThrow(/^ground: unknown ground class "swamp"/);
  });
});
