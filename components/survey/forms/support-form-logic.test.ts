import { describe, expect, it } from 'vitest';
import { M_PER_FT } from '../../../hooks/length-format';
import { checkSupport, draftFromSupport, emptySupportDraft, type SupportDraft } from './support-form-logic';

const siteId = '11111111-1111-4111-8111-111111111111';
const metres = (v: number) => v;
const feet = (v: number) => v * M_PER_FT;
const placed = (over: Partial<SupportDraft> = {}): SupportDraft => ({ ...emptySupportDraft('tree'), label: 'Big oak', lat: 44.5, lon: -93.2, positionAccuracyM: 3, launchMethod: 'throw-bag', ...over });

describe('support form logic (shared supportFieldsSchema + plausibility questions)', () => {
  it('a placed tree with a height in feet is stored in metres (1 ft = 0.3048 m)', () => {
    const r = checkSupport(placed({ heightText: '60', attachHeightText: '45' }), siteId, feet);
    expect(r.errors).toEqual({});
    expect(r.fields?.heightM).toBeCloseTo(18.288, 9);
    expect(r.fields?.attachHeightM).toBeCloseTo(13.716, 9);
    expect(r.fields?.maxEnds).toBe(2);
  });

  it('a 300 m tree is refused with the schema’s plain-words message', () => {
    const r = checkSupport(placed({ heightText: '300' }), siteId, metres);
    expect(r.fields).toBeNull();
    expect(r.errors.heightM).toMatch(/120 m/);
  });

  it('a 45 m tree is saved but questioned; a 25 m mast too', () => {
    const tree = checkSupport(placed({ heightText: '45' }), siteId, metres);
    expect(tree.fields).not.toBeNull();
    expect(tree.questions.join(' ')).toMatch(/45 m tree/);
    const mast = checkSupport(placed({ kind: 'mast', heightText: '25', launchMethod: 'none' }), siteId, metres);
    expect(mast.questions.join(' ')).toMatch(/25 m mast/);
  });

  it('refuses an unplaced support, junk numbers, and an attachment above the top', () => {
    const r = checkSupport({ ...emptySupportDraft('tree'), label: '', heightText: 'tall', attachHeightText: '' }, siteId, metres);
    expect(r.fields).toBeNull();
    expect(r.errors.lat).toMatch(/GPS fix/);
    expect(r.errors.heightM).toMatch(/as a number/);
    expect(r.errors.label).toMatch(/label is required/);
    const above = checkSupport(placed({ heightText: '10', attachHeightText: '12' }), siteId, metres);
    expect(above.errors.attachHeightM).toMatch(/cannot be higher/);
  });

  it('questions a fix worse than half the site, and a merely poor fix on an unknown site', () => {
    expect(checkSupport(placed({ positionAccuracyM: 80 }), siteId, metres, { siteSpanM: 120 }).questions.join(' ')).toMatch(/half the size of the site/);
    expect(checkSupport(placed({ positionAccuracyM: 20 }), siteId, metres).questions.join(' ')).toMatch(/good to 20 m/);
    expect(checkSupport(placed({ positionAccuracyM: 600 }), siteId, metres).errors.positionAccuracyM).toMatch(/500 m/);
  });

  it('opening and saving a support unchanged keeps its measured metres exactly (no rounding to the shown digits)', () => {
    const stored = checkSupport(placed({ heightText: '15.604150764', attachHeightText: '12.4833' }), siteId, metres).fields!;
    const again = checkSupport(draftFromSupport(stored, (x) => x), siteId, metres).fields!;
    expect(again.heightM).toBe(stored.heightM);
    expect(again.attachHeightM).toBe(stored.attachHeightM);
    const edited = checkSupport({ ...draftFromSupport(stored, (x) => x), heightText: '16' }, siteId, metres).fields!;
    expect(edited.heightM).toBe(16);
  });

  it('a stored support comes back into the form in the person’s units', () => {
    const r = checkSupport(placed({ heightText: '18.3' }), siteId, metres);
    const d = draftFromSupport(r.fields!, (m) => m / M_PER_FT);
    expect(d.heightText).toBe('60');
    expect(d.label).toBe('Big oak');
  });
});
