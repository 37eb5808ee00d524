import { afterAll, beforeAll, expect, it } from 'vitest';
import { byTestId, browserForFile, newPage, screenshot } from './helpers/browser';
import { linkIn, waitForMail } from './helpers/mailbox';
import { baseUrl, signIn } from './helpers/session';

/* Issue 2: "Sign up with e-mail and password … reset a forgotten password by e-mail, sign out." */

const browser = browserForFile(beforeAll, afterAll);

it('signs up, signs out, resets the forgotten password from the e-mailed link and signs in with the new one only', async () => {
  const email = `forgetful-${Date.now()}@example.test`;
  const { context, page, errors } = await newPage(browser(), 'phone');

  await page.goto(`${baseUrl()}/sign-up`);
  await byTestId(page, 'sign-up-name').fill('Otto Brandt');
  await byTestId(page, 'sign-up-email').fill(email);
  await byTestId(page, 'sign-up-password').fill('first password here');
  await byTestId(page, 'sign-up-submit').click();
  // A new account belongs to no club yet: the app says so and offers to start one.
  await byTestId(page, 'no-club-title').waitFor();
  await screenshot(page, 'sign-up-no-club', 'phone');
  await page.goto(`${baseUrl()}/settings`);
  await byTestId(page, 'settings-sign-out').click();
  await byTestId(page, 'sign-in-title').waitFor();

  await byTestId(page, 'sign-in-forgot').click();
  await byTestId(page, 'forgot-email').fill(email);
  await byTestId(page, 'forgot-submit').click();
  await byTestId(page, 'forgot-sent').waitFor();
  await screenshot(page, 'forgot-sent', 'phone');

  // Follow the mail through the app's own dev mailbox page, as a person testing without mail would.
  await waitForMail(email, /password/i);
  await page.goto(`${baseUrl()}/mailbox`);
  await page.locator('[data-testid^="mail-"]', { hasText: email }).first().click();
  await byTestId(page, 'mail-open').waitFor();
  await screenshot(page, 'mailbox-open', 'phone');
  await byTestId(page, 'mail-open').locator('[data-testid^="mail-link-"]', { hasText: '/reset-password' }).click();
  await byTestId(page, 'reset-password').fill('second password now');
  await byTestId(page, 'reset-confirm').fill('second password typo');
  await expect.poll(() => byTestId(page, 'reset-confirm-error').innerText()).toContain('differ');
  await byTestId(page, 'reset-confirm').fill('second password now');
  await byTestId(page, 'reset-submit').click();
  await byTestId(page, 'reset-done-sign-in').click();

  // The old password no longer works; the server's refusal is shown in words.
  await byTestId(page, 'sign-in-email').fill(email);
  await byTestId(page, 'sign-in-password').fill('first password here');
  await byTestId(page, 'sign-in-submit').click();
  await byTestId(page, 'sign-in-error').waitFor();
  expect((await byTestId(page, 'sign-in-error').innerText()).length).toBeGreaterThan(5);
  await screenshot(page, 'sign-in-refused', 'phone');

  await signIn(page, email, 'second password now', 'no-club');
  expect(errors).toEqual([]);
  await context.close();
});

it('a used reset link cannot be used twice', async () => {
  const email = `twice-${Date.now()}@example.test`;
  const { context, page } = await newPage(browser(), 'wide');
  const res = await fetch(`${baseUrl()}/api/auth/sign-up`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password: 'original password', displayName: 'Twice' }),
  });
  expect(res.status).toBe(201);
  await page.goto(`${baseUrl()}/forgot-password`);
  await byTestId(page, 'forgot-email').fill(email);
  await byTestId(page, 'forgot-submit').click();
  const link = linkIn(await waitForMail(email, /password/i), '/reset-password');
  for (const attempt of [1, 2]) {
    await page.goto(link);
    await byTestId(page, 'reset-password').fill(`new password number ${attempt}`);
    await byTestId(page, 'reset-confirm').fill(`new password number ${attempt}`);
    await byTestId(page, 'reset-submit').click();
    if (attempt === 1) await byTestId(page, 'reset-done-sign-in').waitFor();
    else await byTestId(page, 'reset-error').waitFor();
  }
  await screenshot(page, 'reset-link-used', 'wide');
  await signIn(page, email, 'new password number 1', 'no-club');
  await context.close();
});
