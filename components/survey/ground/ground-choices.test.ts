import { describe, expect, it } from 'vitest';
import { GROUND_CLASSES, groundFromClass } from '../../../shared/ground';
import { siteFieldsSchema } from '../../../shared/schemas';
import { GROUND_CHOICES, choiceOfSite, classConstants, fieldsForChoice, fieldsForExpert, groundChoice } from './ground-choices';

describe('plain-words ground choices → shared/ground classes', () => {
  it('every choice maps to a class the physics knows (groundFromClass accepts it) and states a reason', () => {
    for (const c of GROUND_CHOICES) {
      expect(() => groundFromClass(c.classId)).not.toThrow();
      expect(c.reason.length).toBeGreaterThan(20);
    }
    expect(new Set(GROUND_CHOICES.map((c) => c.id)).size).toBe(GROUND_CHOICES.length);
  });

  it('wet meadow is the amateur table’s very good ground, σ 0.0303 S/m, εr 20 (ARRL Antenna Book table, REFERENCES.md)', () => {
    expect(groundChoice('wet-meadow').classId).toBe('very-good');
    expect(classConstants('very-good')).toMatchObject({ sigmaSPerM: 0.0303, epsR: 20 });
  });

  it('rocky hillside is poor, dry sand is sandy-dry, sea is salt water (ARRL Antenna Book table descriptions)', () => {
    expect(groundChoice('rocky-hillside').classId).toBe('poor');
    expect(groundChoice('dry-sandy').classId).toBe('sandy-dry');
    expect(groundChoice('over-sea').classId).toBe('salt-water');
    expect(GROUND_CLASSES['salt-water']).toMatchObject({ sigmaSPerM: 5 });
  });

  it('a choice fills the site’s ground fields in a form the site schema accepts, and is recognised again', () => {
    const fields = fieldsForChoice('salt-marsh', 'mud at high tide');
    expect(fields).toEqual({ groundDescription: 'Salt marsh or tidal flat: mud at high tide', groundClass: 'very-good', groundSigmaSPerM: null, groundEpsR: null });
    expect(siteFieldsSchema.partial().safeParse(fields).success).toBe(true);
    expect(choiceOfSite(fields)).toBe('salt-marsh');
  });

  it('the expert override stores σ and εr with no class, and refuses values that are not ground (site schema limits)', () => {
    const ok = fieldsForExpert({ sigmaText: '0,012', epsRText: '25', ownWords: 'measured with a probe' });
    expect(ok).toEqual({ ok: true, fields: { groundDescription: 'measured with a probe', groundClass: null, groundSigmaSPerM: 0.012, groundEpsR: 25 } });
    if (ok.ok) expect(choiceOfSite(ok.fields)).toBe('expert');
    const bad = fieldsForExpert({ sigmaText: '40', epsRText: '0.5', ownWords: '' });
    expect(bad.ok).toBe(false);
    if (!bad.ok) {
      expect(bad.errors.sigma).toMatch(/10 S\/m/);
      expect(bad.errors.epsR).toMatch(/at least 1/);
    }
    const junk = fieldsForExpert({ sigmaText: 'wet', epsRText: '', ownWords: '' });
    expect(junk.ok).toBe(false);
    if (!junk.ok) expect(junk.errors.sigma).toMatch(/S\/m/);
  });

  it('a site seeded with only a class name ("average") shows the first choice of that class', () => {
    expect(choiceOfSite({ groundDescription: '', groundClass: 'average', groundSigmaSPerM: null, groundEpsR: null })).toBe('ordinary-lawn');
  });
});
