import { afterAll, beforeAll, expect, it } from 'vitest';
import { byTestId, browserForFile, newPage, screenshot } from './helpers/browser';
import { DEMO_CLUB, DEMO_USERS } from './helpers/demo-users';
import { goToNav, signIn } from './helpers/session';

/* Issue 2: "create a club"; "A person may belong to several clubs with a different role in each." */

const browser = browserForFile(beforeAll, afterAll);

it('a scout starts a second club, is its admin there and still a scout in the demo club, and switches between them', async () => {
  const name = `Prairie Wire Society ${Date.now() % 10_000}`;
  const { context, page, errors } = await newPage(browser(), 'phone');
  await signIn(page, DEMO_USERS.scout);
  await goToNav(page, 'club');
  await byTestId(page, 'members-new-club').click();
  await byTestId(page, 'club-name').fill(name);
  await byTestId(page, 'club-call-sign').fill('not a call');
  await expect.poll(() => byTestId(page, 'club-call-sign-error').innerText()).toContain('call sign');
  await byTestId(page, 'club-call-sign').fill('w0pws');
  await byTestId(page, 'club-create-submit').click();

  // The new club is current and its creator is its admin: the admin's places and the invite form appear.
  await byTestId(page, 'invite-card').waitFor();
  await expect.poll(() => byTestId(page, 'current-role').innerText()).toContain('Club admin');
  expect(await byTestId(page, 'club-switcher').innerText()).toContain(name.slice(0, 10));
  expect(await byTestId(page, 'current-role').innerText()).toContain('W0PWS');
  await screenshot(page, 'club-created', 'phone');

  await byTestId(page, 'club-switcher').click();
  await byTestId(page, 'club-switcher-sheet').waitFor();
  await screenshot(page, 'club-switcher', 'phone');
  await byTestId(page, 'club-switcher-sheet').getByText(DEMO_CLUB).click();
  await byTestId(page, 'events-title').waitFor();
  await expect.poll(() => byTestId(page, 'current-role').innerText()).toContain('Scout');
  await page.getByText('Midwinter Field Outing').first().waitFor();

  // The choice of club survives a reload (kept on this device).
  await page.reload();
  await expect.poll(() => byTestId(page, 'current-role').innerText()).toContain('Scout');
  expect(errors).toEqual([]);
  await context.close();
});
