/** The event the shell's Plan/Review/Sheets open: the soonest one not yet over, else the latest past one. */
export function pickFocusEvent<E extends { id: string; startsOn: string; endsOn: string; deletedAt?: string | null }>(events: readonly E[], todayIso: string): E | null {
  const live = events.filter((e) => !e.deletedAt);
  const upcoming = live.filter((e) => e.endsOn >= todayIso).sort((a, b) => a.startsOn.localeCompare(b.startsOn));
  if (upcoming.length > 0) return upcoming[0];
  const past = [...live].sort((a, b) => b.endsOn.localeCompare(a.endsOn));
  return past[0] ?? null;
}

/** Today's calendar day in the device's own time zone, as YYYY-MM-DD. */
export function localTodayIso(now: Date = new Date()): string {
  const y = now.getFullYear();
  const m = String(now.getMonth() + 1).padStart(2, '0');
  const d = String(now.getDate()).padStart(2, '0');
  return `${y}-${m}-${d}`;
}
