// Record fields for sync tests (an invented site; values within the schemas' ranges).
import { randomUUID } from 'node:crypto';

export const SITE_ID = '5a1e0000-0000-4000-8000-000000000001';

export function supportFields(label: string, extra: Record<string, unknown> = {}) {
  return { siteId: SITE_ID, kind: 'tree', label, lat: 44.5012, lon: -93.2345, heightM: 18, ...extra };
}

export function measurementFields(subjectId: string, valueM: number) {
  return { siteId: SITE_ID, subjectCollection: 'supports', subjectId, kind: 'height', method: 'tangent', inputs: { distanceM: 20, angleDeg: 40 }, valueM, takenAt: '2026-12-01T15:00:00.000Z' };
}

export const newId = () => randomUUID();
