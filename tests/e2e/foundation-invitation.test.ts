import { afterAll, beforeAll, expect, it } from 'vitest';
import { byTestId, browserForFile, newPage, screenshot } from './helpers/browser';
import { DEMO_CLUB, DEMO_USERS } from './helpers/demo-users';
import { linkIn, waitForMail } from './helpers/mailbox';
import { goToNav, signIn, signOut } from './helpers/session';

/*
 * Issue 2: "invite members by e-mail with a role, accept an invitation from the link in the e-mail";
 * "As an admin, change a member's role or remove them". Walked through the fake mailbox.
 */

const browser = browserForFile(beforeAll, afterAll);

it('admin invites by e-mail, the link in the fake mailbox signs a new person up into the club, the admin changes their role and removes them', async () => {
  const email = `new-scout-${Date.now()}@kestrel.test`;
  const password = 'a long field-day passphrase';

  // The admin invites at the wide viewport.
  const admin = await newPage(browser(), 'wide');
  await signIn(admin.page, DEMO_USERS.admin);
  await goToNav(admin.page, 'club');
  await byTestId(admin.page, 'invite-email').fill('not-an-address');
  await expect.poll(() => byTestId(admin.page, 'invite-email-error').innerText()).toContain('valid e-mail');
  await byTestId(admin.page, 'invite-email').fill(email);
  await byTestId(admin.page, 'invite-role-scout').click();
  await byTestId(admin.page, 'invite-submit').click();
  await byTestId(admin.page, 'invite-sent').waitFor();
  await byTestId(admin.page, `pending-${email}`).waitFor();
  await screenshot(admin.page, 'invite-sent', 'wide');

  // The e-mail arrives through the queue; its link opens the invitation on a phone.
  const mail = await waitForMail(email, /invit/i);
  const link = linkIn(mail, '/invite/');
  const guest = await newPage(browser(), 'phone');
  await guest.page.goto(link);
  await byTestId(guest.page, 'invite-summary').waitFor();
  expect(await byTestId(guest.page, 'invite-summary').innerText()).toContain(DEMO_CLUB);
  expect(await byTestId(guest.page, 'invite-summary').innerText()).toContain('Scout');
  await byTestId(guest.page, 'invite-password').fill('short');
  await expect.poll(() => byTestId(guest.page, 'invite-password-error').innerText()).toContain('at least 10');
  await byTestId(guest.page, 'invite-name').fill('Nell Ferrante');
  await byTestId(guest.page, 'invite-call-sign').fill('kd0nel');
  await byTestId(guest.page, 'invite-password').fill(password);
  await screenshot(guest.page, 'invite-accept', 'phone');
  await byTestId(guest.page, 'invite-sign-up-accept').click();
  await byTestId(guest.page, 'events-title').waitFor();
  await expect.poll(() => byTestId(guest.page, 'current-role').innerText()).toContain('Scout');

  // Signing out and in again as the new member keeps the membership.
  await signOut(guest.page);
  await signIn(guest.page, email, password);
  await expect.poll(() => byTestId(guest.page, 'current-role').innerText()).toContain('Scout');
  await screenshot(guest.page, 'invite-new-member-home', 'phone');

  // The admin sees the new member, changes the role to crew, then removes them.
  await admin.page.reload();
  const row = byTestId(admin.page, `member-${email}`);
  await row.waitFor();
  await row.locator('[data-testid^="member-edit-"]').click();
  await row.locator('[data-testid$="-crew"]').click();
  await expect.poll(() => byTestId(admin.page, `member-role-${email}`).innerText()).toContain('Crew');
  await guest.page.reload();
  await expect.poll(() => byTestId(guest.page, 'current-role').innerText()).toContain('Crew');

  await row.locator('[data-testid^="member-remove-"]').first().click();
  await row.locator('[data-testid^="member-remove-confirm-"]').click();
  await byTestId(admin.page, `member-${email}`).waitFor({ state: 'detached' });
  await guest.page.reload();
  await byTestId(guest.page, 'no-club-title').waitFor();
  await screenshot(guest.page, 'invite-removed-member', 'phone');

  expect(admin.errors).toEqual([]);
  expect(guest.errors).toEqual([]);
  await admin.context.close();
  await guest.context.close();
});
