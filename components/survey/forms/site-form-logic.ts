import { operatingPositionFieldsSchema, siteFieldsSchema, type CollectionFields } from '../../../shared/schemas';
import { checkWith, type FormCheck } from './field-errors';

/* Operating positions (where the tents and generator go) and the site's own notes. */

export type PositionFields = CollectionFields<'operatingPositions'>;
export type PositionDraft = { label: string; lat: number | null; lon: number | null; notes: string };

export function checkPosition(draft: PositionDraft, siteId: string): FormCheck<PositionFields> {
  const errors: Record<string, string> = {};
  if (draft.lat === null || draft.lon === null) errors.lat = errors.lon = 'Place it: use where you stand, or give distance and bearing';
  return checkWith(operatingPositionFieldsSchema, { siteId, label: draft.label, lat: draft.lat ?? Number.NaN, lon: draft.lon ?? Number.NaN, notes: draft.notes }, errors, []);
}

const siteNotesSchema = siteFieldsSchema.pick({ accessNotes: true, rules: true, notes: true });
export type SiteNotesFields = { accessNotes: string; rules: string; notes: string };

/** Rules that change what the crew may do get a reminder, so nobody packs stakes for a no-stakes park. */
const RULE_WORDS: { pattern: RegExp; reminder: string }[] = [
  { pattern: /no\s+stakes?|no\s+digging|no\s+ground\s+(pins?|anchors?)/i, reminder: 'No stakes: guy masts to weights (sandbags, water jugs) or to trees with slings.' },
  { pattern: /no\s+(launchers?|slingshots?|pneumatic|air\s+cannons?)/i, reminder: 'No launchers: lines go up by hand throw or throw-bag only.' },
  { pattern: /no\s+(climbing|tree\s+climbing)/i, reminder: 'No climbing: attachment heights must be reachable from the ground.' },
  { pattern: /no\s+(generators?|gas|petrol|fuel)/i, reminder: 'No generators: plan batteries for the operating positions.' },
];

export function checkSiteNotes(draft: SiteNotesFields): FormCheck<SiteNotesFields> & { reminders: string[] } {
  const reminders = RULE_WORDS.filter((r) => r.pattern.test(draft.rules)).map((r) => r.reminder);
  return { ...checkWith(siteNotesSchema, draft, {}, []), reminders };
}
