import type { Site } from '../schemas/records';

/*
 * Record builders for the unit tests of shared/review (not used by the app): fixed ids and instants, and
 * positions given in metres east and north of a reference point (small-distance flat-earth, 1° of latitude
 * taken as 111 320 m: plenty for tens of metres).
 */
export const T = '2026-12-01T10:00:00.000Z';
export const uuid = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;
export const meta = (n: number) => ({ id: uuid(n), clubId: uuid(999), createdAt: T, updatedAt: T, deletedAt: null });
export const REF = { lat: 44.9312, lon: -92.8671 };
export const at = (e: number, n: number) => ({ lat: REF.lat + n / 111_320, lon: REF.lon + e / (111_320 * Math.cos((REF.lat * Math.PI) / 180)) });
export const testSite: Site = { ...meta(1), name: 'Meadow', refLat: REF.lat, refLon: REF.lon, notes: '', groundDescription: '', groundClass: 'average', groundSigmaSPerM: null, groundEpsR: null, accessNotes: '', rules: '' };
