import { describe, expect, it } from 'vitest';
import { daysUntil, eventTiming, formatDayRange } from './day-range';

// Weekdays checked against the Gregorian calendar: 2026-12-12 is a Saturday (1 Jan 2026 was a Thursday).
describe('event day ranges', () => {
  it('formats one day, a span in one year and a span across New Year', () => {
    expect(formatDayRange('2026-12-12', '2026-12-12')).toBe('Sat 12 Dec 2026');
    expect(formatDayRange('2026-12-12', '2026-12-13')).toBe('Sat 12 Dec – Sun 13 Dec 2026');
    expect(formatDayRange('2026-12-31', '2027-01-01')).toBe('Thu 31 Dec 2026 – Fri 1 Jan 2027');
  });
  it('never shifts a day by the time zone (the days are formatted as UTC calendar days)', () => {
    expect(formatDayRange('2026-01-01', '2026-01-01')).toBe('Thu 1 Jan 2026');
  });
  it('says whether an event is coming, running or over, and how many days away', () => {
    expect(eventTiming('2026-12-12', '2026-12-13', '2026-12-01')).toBe('upcoming');
    expect(eventTiming('2026-11-30', '2026-12-01', '2026-12-01')).toBe('on-now');
    expect(eventTiming('2026-11-01', '2026-11-02', '2026-12-01')).toBe('past');
    expect(daysUntil('2026-12-12', '2026-12-01')).toBe(11);
    expect(daysUntil('2027-01-01', '2026-12-31')).toBe(1);
  });
});
