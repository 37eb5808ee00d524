import type { CollectionFields, Site } from '@/shared/schemas';

/** The writable fields of a stored site (without id, club and timestamps), as the sync client takes them. */
export function siteFieldsOf(s: Site): CollectionFields<'sites'> {
  return {
    name: s.name, refLat: s.refLat, refLon: s.refLon, notes: s.notes, groundDescription: s.groundDescription, groundClass: s.groundClass,
    groundSigmaSPerM: s.groundSigmaSPerM, groundEpsR: s.groundEpsR, accessNotes: s.accessNotes, rules: s.rules,
  };
}
