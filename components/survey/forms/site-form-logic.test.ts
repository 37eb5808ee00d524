import { describe, expect, it } from 'vitest';
import { checkPosition, checkSiteNotes } from './site-form-logic';

const siteId = '11111111-1111-4111-8111-111111111111';

describe('operating position and site notes logic (shared schemas)', () => {
  it('an operating position needs a label and a place', () => {
    expect(checkPosition({ label: 'Tent A', lat: 44.5, lon: -93.2, notes: 'flat, near the car park' }, siteId).fields).toMatchObject({ label: 'Tent A', siteId });
    const r = checkPosition({ label: ' ', lat: null, lon: null, notes: '' }, siteId);
    expect(r.fields).toBeNull();
    expect(r.errors.label).toMatch(/required/);
    expect(r.errors.lat).toMatch(/Place it/);
  });

  it('site rules such as "no stakes" and "no launchers" give the crew a reminder (common practice)', () => {
    const r = checkSiteNotes({ accessNotes: 'Gate code from the ranger', rules: 'No stakes in the lawn\nNo launchers after 18:00', notes: '' });
    expect(r.fields).not.toBeNull();
    expect(r.reminders.join(' ')).toMatch(/weights/);
    expect(r.reminders.join(' ')).toMatch(/hand throw/);
    expect(checkSiteNotes({ accessNotes: '', rules: 'Quiet after 22:00', notes: '' }).reminders).toEqual([]);
  });

  it('refuses notes longer than the site record allows (4000 characters)', () => {
    const r = checkSiteNotes({ accessNotes: 'x'.repeat(4001), rules: '', notes: '' });
    expect(r.errors.accessNotes).toMatch(/4000/);
  });
});
