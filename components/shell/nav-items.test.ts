import { describe, expect, it } from 'vitest';
import { can, ROLES } from '../../shared/schemas';
import { pickFocusEvent } from './focus-event';
import { activeNavKey, BAR_MAX, navItemsFor, splitForBar } from './nav-items';

describe('role-aware navigation', () => {
  it('gives every role Events, Club and Settings, and a phone bar of at most five places', () => {
    for (const role of ROLES) {
      const items = navItemsFor(role, null);
      expect(items.map((i) => i.key)).toEqual(expect.arrayContaining(['events', 'club', 'settings']));
      const { bar, more } = splitForBar(items);
      expect(bar.length).toBeLessThanOrEqual(BAR_MAX);
      expect([...bar, ...more]).toEqual(items);
      if (more.length > 0) expect(bar.length).toBe(BAR_MAX - 1);
    }
  });
  it('shows Plan only to roles that may write the plan, Review to the safety officer (shared/schemas can())', () => {
    for (const role of ROLES) {
      const keys = navItemsFor(role, null).map((i) => i.key);
      expect(keys.includes('plan')).toBe(can(role, 'plan.write'));
      if (can(role, 'review.decide')) expect(keys).toContain('review');
    }
    expect(navItemsFor('crew', null).map((i) => i.key)).toEqual(['events', 'sheets', 'club', 'settings']);
    expect(navItemsFor('scout', null).map((i) => i.key)).toEqual(['events', 'survey', 'club', 'settings']);
  });
  it("puts each role's own job in the phone bar (crew: Sheets, safety: Review, scout: Survey, lead: Plan)", () => {
    const inBar = (role: Parameters<typeof navItemsFor>[0]) => splitForBar(navItemsFor(role, 'e1')).bar.map((i) => i.key);
    expect(inBar('crew')).toContain('sheets');
    expect(inBar('safety')).toContain('review');
    expect(inBar('scout')).toContain('survey');
    expect(inBar('lead')).toContain('plan');
    expect(inBar('admin')).toContain('club');
  });
  it('links Plan/Review/Sheets to the focus event, or to the events list when there is none', () => {
    const withEvent = navItemsFor('lead', 'abc');
    expect(withEvent.find((i) => i.key === 'plan')?.href).toBe('/events/abc/plan');
    expect(withEvent.find((i) => i.key === 'sheets')?.href).toBe('/events/abc/sheets');
    expect(navItemsFor('lead', null).find((i) => i.key === 'review')?.href).toBe('/events');
  });
  it('highlights the place a path belongs to', () => {
    expect(activeNavKey('/')).toBe('events');
    expect(activeNavKey('/events/x')).toBe('events');
    expect(activeNavKey('/events/x/plan')).toBe('plan');
    expect(activeNavKey('/sites/y/survey')).toBe('survey');
    expect(activeNavKey('/club/new')).toBe('club');
    expect(activeNavKey('/mailbox')).toBeNull();
  });
});

describe('focus event', () => {
  const ev = (id: string, startsOn: string, endsOn: string, deletedAt: string | null = null) => ({ id, startsOn, endsOn, deletedAt });
  it('picks the soonest event not yet over, counting one still running today', () => {
    const events = [ev('late', '2026-12-20', '2026-12-21'), ev('now', '2026-11-30', '2026-12-01'), ev('past', '2026-10-01', '2026-10-02')];
    expect(pickFocusEvent(events, '2026-12-01')?.id).toBe('now');
    expect(pickFocusEvent(events, '2026-12-02')?.id).toBe('late');
  });
  it('falls back to the latest past event, skips deleted ones, and gives null for none', () => {
    expect(pickFocusEvent([ev('a', '2026-01-01', '2026-01-02'), ev('b', '2026-03-01', '2026-03-02')], '2026-12-01')?.id).toBe('b');
    expect(pickFocusEvent([ev('gone', '2026-12-20', '2026-12-21', '2026-11-01T00:00:00Z')], '2026-12-01')).toBeNull();
  });
});
