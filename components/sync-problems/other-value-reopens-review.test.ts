import { describe, expect, it } from 'vitest';
import { SAFETY_FIELDS, type Hazard, type Support } from '@/shared/schemas';
import { spotFingerprint } from '@/shared/review';
import { meta, testSite, uuid } from '@/shared/review/test-records';

/*
 * "Use the other value" writes the conflicting field as an ordinary change; a cleared spot goes back to review
 * when its inputs fingerprint changes (shared/review/fingerprint.ts). So every field that can be in conflict
 * (SAFETY_FIELDS, shared/schemas/records.ts) must be part of the fingerprint, or a settled conflict could leave a
 * spot cleared on a value nobody reviewed.
 */

const tree: Support = {
  ...meta(10), siteId: testSite.id, kind: 'tree', label: 'Gate ash', lat: 44.9312, lon: -92.8671, positionAccuracyM: 3, heightM: 14, attachHeightM: 12,
  launchMethod: 'throw-bag', maxEnds: 2, species: '', condition: '', mastModel: '', notes: '',
};
const line: Hazard = {
  ...meta(20), siteId: testSite.id, kind: 'power-line', label: 'County road line', points: [{ lat: 44.932, lon: -92.868 }, { lat: 44.933, lon: -92.866 }],
  isArea: false, heightM: 9, voltageClass: 'distribution', voltageKv: 12.47, notes: '',
};

/** Another valid value of each field, as a second scout might have recorded it. */
const OTHER: Record<string, unknown> = {
  heightM: 11, attachHeightM: 10, lat: 44.9313, lon: -92.8672, maxEnds: 1,
  points: [{ lat: 44.932, lon: -92.868 }, { lat: 44.9331, lon: -92.8661 }], voltageClass: 'transmission', voltageKv: 34.5, kind: 'road',
  groundClass: 'poor', groundSigmaSPerM: 0.001, groundEpsR: 5,
};

const print = (o: { site?: typeof testSite; support?: Support; hazard?: Hazard }) =>
  spotFingerprint({ site: o.site ?? testSite, supportIds: [tree.id, uuid(11)], supports: [o.support ?? tree], hazards: [o.hazard ?? line] });

describe('settling a conflict with the other value re-opens review', () => {
  const cases = Object.entries(SAFETY_FIELDS).flatMap(([collection, fields]) => (fields ?? []).map((f) => [collection, f] as const));

  it('covers every safety field of supports, hazards and sites', () => {
    expect(cases.length).toBeGreaterThanOrEqual(13);
    for (const [, field] of cases) expect(OTHER, field).toHaveProperty(field);
  });

  it.each(cases)('%s.%s: the other value changes the spot’s inputs fingerprint (shared/review/fingerprint.ts)', (collection, field) => {
    const before = print({});
    const after =
      collection === 'supports' ? print({ support: { ...tree, [field]: OTHER[field] } as Support })
      : collection === 'hazards' ? print({ hazard: { ...line, [field]: OTHER[field] } as Hazard })
      : print({ site: { ...testSite, [field]: OTHER[field] } });
    expect(after).not.toBe(before);
  });
});
