import type { Page } from 'playwright-core';
import { inject } from 'vitest';
import { byTestId } from './browser';
import { DEMO_PASSWORD } from './demo-users';

export const baseUrl = (): string => inject('baseUrl');

/** Sign in through the real form and wait for the signed-in shell. */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD, landsOn: 'events' | 'no-club' = 'events'): Promise<void> {
  await page.goto(`${baseUrl()}/sign-in`);
  await byTestId(page, 'sign-in-email').fill(email);
  await byTestId(page, 'sign-in-password').fill(password);
  await byTestId(page, 'sign-in-submit').click();
  // A person in no club lands on the welcome page instead of the events.
  await byTestId(page, landsOn === 'events' ? 'events-title' : 'no-club-title').waitFor({ timeout: 30_000 });
}

/** Sign out from Settings (reached through the bar, the More sheet or the side nav). */
export async function signOut(page: Page): Promise<void> {
  await goToNav(page, 'settings');
  await byTestId(page, 'settings-sign-out').click();
  await byTestId(page, 'sign-in-title').waitFor();
}

/** Open a place in the navigation, through "More" on a phone when it is not in the bar. */
export async function goToNav(page: Page, key: string): Promise<void> {
  const side = byTestId(page, 'side-nav');
  if (await side.isVisible()) return side.locator(`[data-testid="nav-${key}"]`).click();
  const inBar = byTestId(page, 'bottom-bar').locator(`[data-testid="nav-${key}"]`);
  if (await inBar.count()) return inBar.click();
  await byTestId(page, 'nav-more').click();
  const sheet = byTestId(page, 'nav-more-sheet');
  await sheet.locator(`[data-testid="nav-${key}"]`).click();
  await sheet.waitFor({ state: 'detached' });
}
