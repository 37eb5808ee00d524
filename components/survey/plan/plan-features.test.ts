import { describe, expect, it } from 'vitest';
import type { Hazard, OperatingPosition, Support } from '../../../shared/schemas';
import { buildFeatures, featurePoints, featureRef, hitTest, insidePolygon } from './plan-features';

// A flat test projection: 1e-5 degree = 1 m both ways. The real one is shared/geo's; this file only arranges.
const project = (lat: number, lon: number) => ({ eastM: lon * 1e5, northM: lat * 1e5 });
const meta = { clubId: '00000000-0000-4000-8000-000000000000', createdAt: '2026-12-01T00:00:00Z', updatedAt: '2026-12-01T00:00:00Z', deletedAt: null as string | null };
const siteId = '11111111-1111-4111-8111-111111111111';

const support = (id: string, lat: number, lon: number, extra: Partial<Support> = {}): Support => ({
  ...meta, id, siteId, kind: 'tree', label: id, lat, lon, positionAccuracyM: 3, heightM: 15, attachHeightM: 12, launchMethod: null, maxEnds: 2,
  species: '', condition: '', mastModel: '', notes: '', ...extra,
});
const hazard = (id: string, points: [number, number][], extra: Partial<Hazard> = {}): Hazard => ({
  ...meta, id, siteId, kind: 'power-line', label: id, points: points.map(([lat, lon]) => ({ lat, lon })), isArea: false, heightM: 9,
  voltageClass: 'distribution', voltageKv: 12.47, notes: '', ...extra,
});
const position = (id: string, lat: number, lon: number): OperatingPosition => ({ ...meta, id, siteId, label: id, lat, lon, notes: '' });

const view = { centreEastM: 0, centreNorthM: 0, pxPerM: 2 };
const size = { widthPx: 400, heightPx: 400 };

describe('plan features (records → drawable things in local metres)', () => {
  it('projects every live record, leaves deleted ones out, and draws areas under lines under power lines', () => {
    const features = buildFeatures({
      supports: [support('oak', 0.0001, 0.0002), support('gone', 0, 0, { deletedAt: '2026-12-01T01:00:00Z' })],
      hazards: [hazard('line', [[0, 0], [0, 0.001]]), hazard('lot', [[0, 0], [0.0001, 0], [0.0001, 0.0001]], { kind: 'parking', isArea: true, voltageClass: null })],
      operatingPositions: [position('tent', -0.0001, 0)],
    }, project);
    expect(features.map((f) => f.id)).toEqual(['lot', 'line', 'tent', 'oak']);
    const oak = features.find((f) => f.id === 'oak');
    expect(oak).toMatchObject({ type: 'support', at: { eastM: 20, northM: 10 } });
    expect(featurePoints(features)).toHaveLength(3 + 2 + 1 + 1);
    expect(featureRef(features[2])).toEqual({ collection: 'operatingPositions', id: 'tent' });
  });

  it('a tap near a tree picks the tree even though a power line passes under it', () => {
    const features = buildFeatures({ supports: [support('oak', 0, 0.0001)], hazards: [hazard('line', [[0, -0.001], [0, 0.001]])], operatingPositions: [] }, project);
    // oak at east 10 m → screen (220, 200); the line runs along y = 200.
    expect(hitTest(features, view, size, { x: 226, y: 204 })?.id).toBe('oak');
    expect(hitTest(features, view, size, { x: 120, y: 210 })?.id).toBe('line');
    expect(hitTest(features, view, size, { x: 120, y: 260 })).toBeNull();
  });

  it('a tap inside an area picks it; even-odd rule for the inside test', () => {
    const square = [{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 100, y: 100 }, { x: 0, y: 100 }];
    expect(insidePolygon({ x: 50, y: 50 }, square)).toBe(true);
    expect(insidePolygon({ x: 150, y: 50 }, square)).toBe(false);
    const lot = buildFeatures({ supports: [], operatingPositions: [], hazards: [hazard('lot', [[0, 0], [0.0005, 0], [0.0005, 0.0005], [0, 0.0005]], { kind: 'parking', isArea: true })] }, project);
    // 50 m square → 100 px; its middle at (250, 150).
    expect(hitTest(lot, view, size, { x: 250, y: 150 })?.id).toBe('lot');
  });
});
