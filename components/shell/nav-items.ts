import type { IconName } from '@/constants/icons';
import type { Role } from '@/shared/schemas';

/*
 * Where each role goes. The order puts a role's own job first after Events, so a phone's bottom bar
 * (at most five places) always holds what that person came to do; the rest sit under "More".
 */

export type NavKey = 'events' | 'survey' | 'plan' | 'review' | 'sheets' | 'club' | 'settings';
export type NavItem = { key: NavKey; label: string; icon: IconName; href: string; accessibilityLabel: string };

const ORDER: Record<Role, NavKey[]> = {
  admin: ['events', 'club', 'survey', 'plan', 'sheets', 'review', 'settings'],
  lead: ['events', 'plan', 'survey', 'review', 'sheets', 'club', 'settings'],
  safety: ['events', 'review', 'survey', 'sheets', 'club', 'settings'],
  scout: ['events', 'survey', 'club', 'settings'],
  crew: ['events', 'sheets', 'club', 'settings'],
};

const LOOK: Record<NavKey, { label: string; icon: IconName; hint: string }> = {
  events: { label: 'Events', icon: 'calendar', hint: "The club's field days" },
  survey: { label: 'Survey', icon: 'tree', hint: 'Sites and what the scouts recorded' },
  plan: { label: 'Plan', icon: 'drafting', hint: 'Where each antenna goes' },
  review: { label: 'Review', icon: 'shield', hint: 'Clearance reviews' },
  sheets: { label: 'Sheets', icon: 'clipboard', hint: 'One sheet per antenna for the crews' },
  club: { label: 'Club', icon: 'people', hint: 'Members and invitations' },
  settings: { label: 'Settings', icon: 'gear', hint: 'Units and signing out' },
};

/**
 * Plan, Review and Sheets belong to an event: they open the focus event (the next one coming up)
 * and fall back to the events list, where the person picks one.
 */
export function navItemsFor(role: Role, focusEventId: string | null): NavItem[] {
  const eventHref = (part: string) => (focusEventId ? `/events/${focusEventId}/${part}` : '/events');
  const href: Record<NavKey, string> = {
    events: '/events',
    survey: '/sites',
    plan: eventHref('plan'),
    review: eventHref('review'),
    sheets: eventHref('sheets'),
    club: '/club',
    settings: '/settings',
  };
  return ORDER[role].map((key) => ({ key, label: LOOK[key].label, icon: LOOK[key].icon, href: href[key], accessibilityLabel: `${LOOK[key].label}: ${LOOK[key].hint}` }));
}

export const BAR_MAX = 5;

/** A phone bar holds at most five places; with more, four stay and a fifth "More" opens the rest. */
export function splitForBar(items: NavItem[]): { bar: NavItem[]; more: NavItem[] } {
  if (items.length <= BAR_MAX) return { bar: items, more: [] };
  return { bar: items.slice(0, BAR_MAX - 1), more: items.slice(BAR_MAX - 1) };
}

/** Which place a path belongs to, for the highlighted item. */
export function activeNavKey(pathname: string): NavKey | null {
  if (pathname === '/' || pathname.startsWith('/events')) {
    if (/^\/events\/[^/]+\/plan/.test(pathname)) return 'plan';
    if (/^\/events\/[^/]+\/review/.test(pathname)) return 'review';
    if (/^\/events\/[^/]+\/sheets/.test(pathname)) return 'sheets';
    return 'events';
  }
  if (pathname.startsWith('/sites')) return 'survey';
  if (pathname.startsWith('/club')) return 'club';
  if (pathname.startsWith('/settings')) return 'settings';
  return null;
}
