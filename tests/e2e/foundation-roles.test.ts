import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLE_LABELS, type Role } from '../../shared/schemas';
import { byTestId, browserForFile, newPage, screenshot, VIEWPORTS, type ViewportName } from './helpers/browser';
import { DEMO_CLUB, DEMO_USERS } from './helpers/demo-users';
import { goToNav, signIn } from './helpers/session';

/*
 * Each demo role signs in at a phone (390×844) and a wide (1280×800) viewport and sees the places and
 * controls its abilities allow (shared/schemas/roles.ts GRANTS; issue 2 "each seeing what their role allows").
 */

const PLACES: Record<Role, string[]> = {
  admin: ['events', 'club', 'survey', 'plan', 'sheets', 'review', 'settings'],
  lead: ['events', 'plan', 'survey', 'review', 'sheets', 'club', 'settings'],
  safety: ['events', 'review', 'survey', 'sheets', 'club', 'settings'],
  scout: ['events', 'survey', 'club', 'settings'],
  crew: ['events', 'sheets', 'club', 'settings'],
};
const ALL = ['events', 'survey', 'plan', 'review', 'sheets', 'club', 'settings'];
const WRITES_EVENTS: Record<Role, boolean> = { admin: true, lead: true, safety: false, scout: false, crew: false };

const browser = browserForFile(beforeAll, afterAll);

describe.each(Object.keys(VIEWPORTS) as ViewportName[])('at the %s viewport', (viewport) => {
  it.each(Object.keys(PLACES) as Role[])('%s signs in and sees the places and controls of that role', async (role) => {
    const { context, page, errors } = await newPage(browser(), viewport);
    try {
      await signIn(page, DEMO_USERS[role]);
      await expect.poll(() => byTestId(page, 'current-role').first().innerText()).toContain(ROLE_LABELS[role]);
      expect(await byTestId(page, 'club-switcher').first().innerText()).toContain(DEMO_CLUB.slice(0, 12));
      // The demo event is on everyone's home screen.
      await page.getByText('Midwinter Field Outing', { exact: false }).first().waitFor();

      let shown: string[];
      if (viewport === 'phone') {
        const bar = byTestId(page, 'bottom-bar');
        const inBar = await bar.locator('[data-testid^="nav-"]').evaluateAll((els) => els.map((e) => e.getAttribute('data-testid')!.slice(4)));
        expect(inBar.length, 'a phone bar holds at most five places').toBeLessThanOrEqual(5);
        shown = inBar.filter((k) => k !== 'more');
        if (inBar.includes('more')) {
          await byTestId(page, 'nav-more').click();
          const sheet = byTestId(page, 'nav-more-sheet');
          await sheet.waitFor();
          for (const k of ALL) if ((await sheet.locator(`[data-testid="nav-${k}"]`).count()) > 0) shown.push(k);
          await byTestId(page, 'nav-more-backdrop').click({ position: { x: 10, y: 10 } });
          await sheet.waitFor({ state: 'detached' });
        }
        expect(await byTestId(page, 'side-nav').count()).toBe(0);
      } else {
        shown = await byTestId(page, 'side-nav').locator('[data-testid^="nav-"]').evaluateAll((els) => els.map((e) => e.getAttribute('data-testid')!.slice(4)));
        expect(await byTestId(page, 'bottom-bar').count()).toBe(0);
      }
      expect([...shown].sort()).toEqual([...PLACES[role]].sort());

      expect(await byTestId(page, 'events-new').isVisible()).toBe(WRITES_EVENTS[role]);
      await screenshot(page, `roles-${role}-events`, viewport);

      await goToNav(page, 'club');
      await byTestId(page, 'members-card').waitFor();
      expect(await byTestId(page, 'invite-card').isVisible(), 'only an admin invites').toBe(role === 'admin');
      // Every member reads the member list.
      await byTestId(page, `member-${DEMO_USERS.crew}`).waitFor();
      await screenshot(page, `roles-${role}-club`, viewport);
      expect(errors).toEqual([]);
    } finally {
      await context.close();
    }
  });
});
