import { describe, expect, it } from 'vitest';
import { SITE_SURVEY_FIELDS } from '../../../shared/schemas';
import { mayWrite } from '../../../sync/protocol';
import { fieldsForChoice } from '../ground/ground-choices';
import { checkSiteNotes } from './site-form-logic';

describe('what a scout may write on a site (roles.ts: survey.write covers ground and site notes)', () => {
  it('a scout may change the ground and the site notes of an existing site, and nothing else on it', () => {
    const ground = Object.keys(fieldsForChoice('wet-meadow'));
    const notes = Object.keys(checkSiteNotes({ accessNotes: 'gate', rules: 'no stakes', notes: '' }).fields!);
    for (const keys of [ground, notes]) {
      expect(keys.every((k) => (SITE_SURVEY_FIELDS as readonly string[]).includes(k))).toBe(true);
      expect(mayWrite('scout', 'sites', 'upsert', keys, false)).toBe(true);
    }
    expect(mayWrite('scout', 'sites', 'upsert', ['name'], false)).toBe(false);
    expect(mayWrite('scout', 'sites', 'upsert', ['groundClass', 'refLat'], false)).toBe(false);
    expect(mayWrite('scout', 'sites', 'upsert', ['groundClass'], true)).toBe(false);
    expect(mayWrite('scout', 'sites', 'delete', [], false)).toBe(false);
    expect(mayWrite('crew', 'sites', 'upsert', ['groundClass'], false)).toBe(false);
  });
});
