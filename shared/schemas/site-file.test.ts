import { describe, expect, it } from 'vitest';
import { parseSiteFile } from './site-file';

function minimal(): Record<string, unknown> {
  return {
    version: 1,
    reference: { lat: 44.5, lon: -93.2 },
    ground: 'average',
    supports: [{ id: 'T1', kind: 'tree', lat: 44.5, lon: -93.2, heightM: 18, attachHeightM: 15 }],
    hazards: [{ id: 'L1', kind: 'power-line', points: [{ lat: 44.5, lon: -93.21 }, { lat: 44.51, lon: -93.21 }] }],
    operatingPositions: [{ id: 'OP1', lat: 44.5, lon: -93.2 }],
    stations: [{ id: 'S40', bands: ['40m'], powerW: 100, mode: 'ssb' }],
    coax: [{ id: 'C1', type: 'RG-8X', lengthM: 30 }],
  };
}

describe('site file v1 schema', () => {
  it('accepts a minimal file, from JSON text too', () => {
    expect(parseSiteFile(minimal()).ok).toBe(true);
    expect(parseSiteFile(JSON.stringify(minimal())).ok).toBe(true);
  });

  it('rejects an unknown field with its path', () => {
    const f = minimal();
    (f.supports as Record<string, unknown>[])[0].heigthM = 3;
    const r = parseSiteFile(f);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors).toContain('supports[0].heigthM: unknown field');
  });

  it('rejects an unknown top-level field and a wrong version', () => {
    const r = parseSiteFile({ ...minimal(), extra: 1, version: 2 });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.errors).toContain('extra: unknown field');
      expect(r.errors).toContain('version: version must be 1');
    }
  });

  it('names the field of a bad value: height, band, attachment above height', () => {
    const f = minimal();
    const supports = f.supports as Record<string, unknown>[];
    supports[0].attachHeightM = 20;
    supports.push({ id: 'T1', kind: 'tree', lat: 44.5, lon: -93.2, heightM: -1 });
    (f.stations as Record<string, unknown>[])[0].bands = ['41m'];
    const r = parseSiteFile(f);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.errors.some((e) => e.startsWith('supports[0].attachHeightM: attachment height cannot be above'))).toBe(true);
      expect(r.errors.some((e) => e.startsWith('supports[1].heightM: height must be above 0'))).toBe(true);
      expect(r.errors.some((e) => e.startsWith('stations[0].bands[0]: band must be one of'))).toBe(true);
    }
  });

  it('a duplicate id names both places (checked once the values themselves are valid)', () => {
    const f = minimal();
    (f.supports as Record<string, unknown>[]).push({ id: 'T1', kind: 'mast', lat: 44.5, lon: -93.2, heightM: 9 });
    const r = parseSiteFile(f);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors).toEqual(['supports[1].id: duplicate id "T1" (also supports[0])']);
  });

  it('a power line may omit its voltage (planned as transmission) but needs two points; others have no voltage', () => {
    const f = minimal();
    const hazards = f.hazards as Record<string, unknown>[];
    hazards.push({ id: 'L2', kind: 'power-line', points: [{ lat: 44.5, lon: -93.2 }] });
    hazards.push({ id: 'P1', kind: 'path', points: [{ lat: 44.5, lon: -93.2 }], voltageKv: 7 });
    const r = parseSiteFile(f);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors).toEqual(['hazards[1].points: a power line needs at least two points', 'hazards[2].voltageKv: only a power line has a voltage']);
  });

  it('ground is a class name or strict measured constants', () => {
    expect(parseSiteFile({ ...minimal(), ground: { sigmaSPerM: 0.005, epsR: 13 } }).ok).toBe(true);
    const r = parseSiteFile({ ...minimal(), ground: { sigmaSPerM: 0.005, epsR: 13, colour: 'brown' } });
    expect(r.ok).toBe(false);
  });

  it('an unknown ground class names the field and the known classes', () => {
    const r = parseSiteFile({ ...minimal(), ground: 'swamp' });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors[0]).toMatch(/^ground: unknown ground class \(known: free-space, perfect, very-good, average/);
  });

  it('bad JSON text is one clear line', () => {
    const r = parseSiteFile('{"version": 1,');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors[0]).toMatch(/^\(file\): not valid JSON/);
  });
});
