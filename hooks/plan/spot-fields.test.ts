import { describe, expect, it } from 'vitest';
import { evaluateSpot } from '@/shared/plan';
import { antennaSpotFieldsSchema } from '@/shared/schemas';
import type { SiteFile } from '@/shared/schemas/site-file';
import type { AntennaSpot } from '@/shared/schemas';
import { sameSpot, spotFieldsFor } from './spot-fields';

const REF = { lat: 44.9312, lon: -92.8671 };
const at = (e: number, n: number) => ({ lat: REF.lat + n / 111_320, lon: REF.lon + e / (111_320 * Math.cos((REF.lat * Math.PI) / 180)) });
const site: SiteFile = {
  version: 1,
  name: 'Assign test',
  reference: REF,
  ground: 'average',
  supports: [
    { id: 'oak', kind: 'tree', ...at(0, 0), heightM: 12, attachHeightM: 11 },
    { id: 'ash', kind: 'tree', ...at(-20, 0), heightM: 12, attachHeightM: 11 },
  ],
  hazards: [],
  operatingPositions: [],
  stations: [{ id: 'st', bands: ['20m'], powerW: 100, mode: 'cw', purpose: 'long-distance' }],
  coax: [],
};
const EVENT = '00000000-0000-4000-8000-000000000061';

describe('the antenna-spot fields an assignment writes', () => {
  it('an inverted-V stores the bearing its legs run (here a typed 30°), and the record schema accepts it', () => {
    const c = evaluateSpot(site, { stationId: 'st', band: '20m', shape: 'inverted-v', supportIds: ['oak'], legAzimuthDeg: 30 })!.candidate;
    const fields = spotFieldsFor(c, EVENT, 'Assigned by the lead');
    expect(fields.legAzimuthDeg).toBe(30);
    expect(fields.state).toBe('planned');
    expect(antennaSpotFieldsSchema.safeParse({ ...fields, stationId: EVENT, supportIds: [EVENT], notes: '' }).success).toBe(true);
  });

  it('a flat-top stores no leg bearing (the schema refuses one on a flat-top)', () => {
    const c = evaluateSpot(site, { stationId: 'st', band: '20m', shape: 'flat', supportIds: ['oak', 'ash'] })!.candidate;
    const fields = spotFieldsFor(c, EVENT, 'Assigned by the lead');
    expect(fields.legAzimuthDeg).toBeNull();
    expect(antennaSpotFieldsSchema.safeParse({ ...fields, stationId: EVENT, supportIds: [EVENT, EVENT], notes: '', legAzimuthDeg: 90 }).success).toBe(false);
  });

  it('another leg direction of the same support is a different spot (the assignment moves and goes back to planned)', () => {
    const iv = (az: number) => evaluateSpot(site, { stationId: 'st', band: '20m', shape: 'inverted-v', supportIds: ['oak'], legAzimuthDeg: az })!.candidate;
    const stored = { ...spotFieldsFor(iv(0), EVENT, 'Assigned'), notes: '', id: EVENT, clubId: EVENT, createdAt: '', updatedAt: '', deletedAt: null } as AntennaSpot;
    expect(sameSpot(stored, iv(0))).toBe(true);
    expect(sameSpot(stored, iv(90))).toBe(false);
    expect(sameSpot({ ...stored, legAzimuthDeg: null }, iv(0))).toBe(false);
  });
});
