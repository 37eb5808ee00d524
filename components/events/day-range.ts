/*
 * Event days are calendar days (YYYY-MM-DD) with no time zone: a field day on 12 December is on
 * 12 December wherever the phone is. They are formatted as UTC so no offset can move them a day.
 */

// Written out by hand: Intl output differs between browsers and ICU versions (commas, dots).
const WEEKDAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'];
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
const noYear = { format: (d: Date) => `${WEEKDAYS[d.getUTCDay()]} ${d.getUTCDate()} ${MONTHS[d.getUTCMonth()]}` };
const full = { format: (d: Date) => `${noYear.format(d)} ${d.getUTCFullYear()}` };

function asUtc(day: string): Date {
  return new Date(`${day}T00:00:00Z`);
}

/** "Sat 12 Dec 2026", or "Sat 12 Dec – Sun 13 Dec 2026" for a span within one year. */
export function formatDayRange(startsOn: string, endsOn: string): string {
  const a = asUtc(startsOn);
  const b = asUtc(endsOn);
  if (Number.isNaN(a.getTime()) || Number.isNaN(b.getTime())) return `${startsOn} – ${endsOn}`;
  if (startsOn === endsOn) return full.format(a);
  if (a.getUTCFullYear() === b.getUTCFullYear()) return `${noYear.format(a)} – ${full.format(b)}`;
  return `${full.format(a)} – ${full.format(b)}`;
}

export type EventTiming = 'upcoming' | 'on-now' | 'past';

export function eventTiming(startsOn: string, endsOn: string, todayIso: string): EventTiming {
  if (endsOn < todayIso) return 'past';
  if (startsOn <= todayIso) return 'on-now';
  return 'upcoming';
}

/** Whole days from today to the first day (0 today, negative once started). */
export function daysUntil(startsOn: string, todayIso: string): number {
  return Math.round((asUtc(startsOn).getTime() - asUtc(todayIso).getTime()) / 86_400_000);
}
