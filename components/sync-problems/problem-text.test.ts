import { describe, expect, it } from 'vitest';
import { formatLength } from '@/hooks/length-format';
import { CONFLICT_CAUTION, conflictSentence, fieldWords, isHeightOrLineConflict, recordWords, refusedWords, sentenceCase, valueWords } from './problem-text';

const metric = (m: number | null | undefined) => formatLength(m, 'metric');
const imperial = (m: number | null | undefined) => formatLength(m, 'imperial');
// 10:02 and 10:01 local time on the day the screen is looked at (toLocaleTimeString, hour and minute).
const today = new Date(2026, 11, 2, 10, 2, 0).getTime();
const hm = (ms: number) => new Date(ms).toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' });

describe('conflict sentence', () => {
  it('names the record, the field, both values with who and when, and says "kept", never "correct"', () => {
    const s = conflictSentence({
      record: 'Tree 4',
      collection: 'supports',
      field: 'heightM',
      kept: { value: 14, who: 'Ana Scout', wallMs: today },
      other: { value: 11, who: 'Ben Scout', wallMs: today - 60_000 },
      nowMs: today + 5 * 60_000,
      formatLengthM: metric,
    });
    expect(s).toBe(`Tree 4 height: kept 14.0 m (Ana Scout, ${hm(today)}); also recorded 11.0 m (Ben Scout, ${hm(today - 60_000)})`);
    expect(s).not.toMatch(/correct|right value/i);
    expect(CONFLICT_CAUTION).toMatch(/checked on site/);
    expect(CONFLICT_CAUTION).toMatch(/not the correct one/);
  });

  it('shows lengths in feet when the person chose feet (1 ft = 0.3048 m exactly, NIST Handbook 44 App. C)', () => {
    expect(valueWords('heightM', 14, imperial)).toBe('46 ft');
    expect(valueWords('attachHeightM', 3.048, imperial)).toBe('10 ft');
  });

  it('two values recorded within one minute show their seconds, so they do not read as the same time', () => {
    const s = conflictSentence({ record: 'Gate oak', collection: 'supports', field: 'heightM', kept: { value: 9, who: 'A', wallMs: today + 40_000 }, other: { value: 8, who: 'B', wallMs: today + 10_000 }, nowMs: today, formatLengthM: metric });
    const hms = (ms: number) => new Date(ms).toLocaleTimeString([], { hour: '2-digit', minute: '2-digit', second: '2-digit' });
    expect(s).toContain(`(A, ${hms(today + 40_000)})`);
    expect(s).toContain(`(B, ${hms(today + 10_000)})`);
  });

  it('adds the date when the value was recorded on another day', () => {
    const yesterday = today - 24 * 3600_000;
    const s = conflictSentence({ record: 'Gate oak', collection: 'supports', field: 'heightM', kept: { value: 9, who: 'A', wallMs: yesterday }, other: { value: 8, who: 'B', wallMs: yesterday }, nowMs: today, formatLengthM: metric });
    expect(s).toContain(new Date(yesterday).toLocaleDateString([], { month: 'short', day: 'numeric' }));
  });
});

describe('field and value words', () => {
  it('a power line’s height is the wire’s height; its points and voltage read as a person would say them', () => {
    expect(fieldWords('hazards', 'heightM')).toBe('wire height');
    expect(fieldWords('supports', 'heightM')).toBe('height');
    expect(valueWords('voltageKv', 12.47, metric)).toBe('12.47 kV');
    expect(valueWords('points', [{ lat: 44.93121, lon: -92.86712 }, { lat: 44.9315, lon: -92.866 }], metric)).toBe('2 points from 44.93121°, -92.86712°');
    expect(valueWords('groundSigmaSPerM', 0.005, metric)).toBe('0.005 S/m');
    expect(valueWords('heightM', null, metric)).toBe('nothing recorded');
    expect(fieldWords('stations', 'powerW')).toBe('power');
    expect(fieldWords('antennaSpots', 'spanM')).toBe('span');
    expect(valueWords('legAzimuthDeg', 45, metric)).toBe('45°');
  });

  it('height and power-line disagreements carry the power-line caution; a site’s ground does not', () => {
    expect(isHeightOrLineConflict('supports', 'heightM')).toBe(true);
    expect(isHeightOrLineConflict('hazards', 'points')).toBe(true);
    expect(isHeightOrLineConflict('supports', 'lat')).toBe(false);
    expect(isHeightOrLineConflict('sites', 'groundClass')).toBe(false);
  });
});

describe('record and refused-change words', () => {
  it('uses the label a scout gave, a station’s name from the refused fields, or says the record is not on this device', () => {
    expect(recordWords('supports', { label: 'Tree 4' })).toBe('Tree 4');
    expect(recordWords('stations', null, { name: 'Station 1' })).toBe('Station 1');
    expect(recordWords('hazards', null)).toBe('a hazard not on this device');
  });

  it('a refused new station reads as what was sent, without ids', () => {
    const s = refusedWords({ collection: 'stations', op: 'upsert', record: 'Station 1', fields: { mode: 'ssb', eventId: 'x', name: 'Station 1', bands: ['40m', '20m'], powerW: 100 }, formatLengthM: metric });
    expect(s).toBe('change of station “Station 1”: name Station 1 · mode ssb · bands 40m, 20m · power 100 W');
    expect(sentenceCase('your role in this club (scout) may not change stations')).toBe('Your role in this club (scout) may not change stations');
  });
});
