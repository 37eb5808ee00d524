import { describe, expect, it } from 'vitest';
import { groundFromClass } from '../../shared/ground';
import { feedSweep, resonanceInfo, summarizePattern, swr, type DipoleInput } from '../../shared/pattern';
import { halfWaveCutM } from '../../shared/wire';

const forty: DipoleInput = { freqMhz: 7.15, ground: groundFromClass('average'), shape: 'flat', heightM: 12 };

describe('feed point across frequency', () => {
  it('SWR of a load on 50 Ω: 50 Ω → 1, 100 Ω → 2, 25 Ω → 2, 50 + j50 → 2.62 (|Γ| = |Z − Z0|/|Z + Z0|, textbook)', () => {
    expect(swr(50, 0)).toBeCloseTo(1, 12);
    expect(swr(100, 0)).toBeCloseTo(2, 12);
    expect(swr(25, 0)).toBeCloseTo(2, 12);
    expect(swr(50, 50)).toBeCloseTo(2.618, 3);
    expect(() => swr(50, 0, 0)).toThrow(/line impedance/);
  });

  it('a sweep keeps the wire cut for the design frequency: reactance rises through zero across 40 m', () => {
    const sweep = feedSweep(forty, 6.8, 7.6, 17);
    expect(sweep).toHaveLength(17);
    for (let i = 1; i < sweep.length; i++) expect(sweep[i].reactanceOhm).toBeGreaterThan(sweep[i - 1].reactanceOhm);
    expect(sweep.every((p) => p.swr50 >= 1 && Number.isFinite(p.swr50))).toBe(true);
  });

  it('lowest SWR and zero reactance are found and differ (R at resonance is not 50 Ω)', () => {
    const r = resonanceInfo(forty, 6.5, 8);
    expect(r.zeroReactanceMhz).not.toBeNull();
    expect(r.lowestSwr).toBeGreaterThanOrEqual(1);
    expect(Math.abs(r.lowestSwrMhz - (r.zeroReactanceMhz as number))).toBeGreaterThan(0.001);
    // the practical 468/f cut lands within a few per cent of the design frequency in this model
    expect(Math.abs((r.zeroReactanceMhz as number) / 7.15 - 1)).toBeLessThan(0.05);
  });

  it('a 40 m dipole used on 15 m is near its 3/2-wave resonance: SWR well above 1.5 across the band, resonance just above it', () => {
    const lengthM = halfWaveCutM(7.15);
    const sweep = feedSweep({ ...forty, lengthM }, 21.0, 21.45, 10);
    expect(Math.min(...sweep.map((p) => p.swr50))).toBeGreaterThan(1.5);
    const r = resonanceInfo({ ...forty, lengthM }, 20, 24);
    expect(r.zeroReactanceMhz).not.toBeNull();
    expect(r.zeroReactanceMhz as number).toBeGreaterThan(21.45);
    // 3/2-wave resonance of a thin wire near 1.48 λ (REFERENCES.md): f ≈ 1.48·c/L
    expect(Math.abs((r.zeroReactanceMhz as number) - (1.48 * 299.792458) / lengthM)).toBeLessThan(0.4);
  });

  it('bad ranges get a clear error', () => {
    expect(() => feedSweep(forty, 8, 7, 10)).toThrow(/0 < from < to/);
    expect(() => feedSweep(forty, 7, 8, 1)).toThrow(/steps/);
  });

  it('the summary says where a case stretches the model (model limits in README)', () => {
    expect(summarizePattern(forty).modelNotes).toEqual([]);
    const onTwenty = summarizePattern({ ...forty, freqMhz: 14.1, lengthM: halfWaveCutM(7.15) });
    expect(onTwenty.modelNotes.join(' ')).toMatch(/full wavelength/);
    expect(onTwenty.feed.resistanceOhm).toBeGreaterThan(1000); // near a full wave the feed current nearly vanishes
    const low160 = summarizePattern({ freqMhz: 1.85, ground: groundFromClass('average'), shape: 'flat', heightM: 10 });
    expect(low160.modelNotes.join(' ')).toMatch(/lower than 0\.1 wavelength/);
  });
});
