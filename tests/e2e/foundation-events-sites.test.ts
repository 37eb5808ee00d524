import { afterAll, beforeAll, expect, it } from 'vitest';
import { byTestId, browserForFile, newPage, screenshot } from './helpers/browser';
import { DEMO_SITE, DEMO_USERS } from './helpers/demo-users';
import { goToNav, signIn } from './helpers/session';

/*
 * Issue 2: "Create an event (a field day outing: name, dates …) at a site (name, a reference point,
 * notes) and see the club's events and sites in lists that work on a phone and as tables on a wide screen."
 */

const browser = browserForFile(beforeAll, afterAll);

it('the lead adds a site with a typed reference point, refused in plain words when out of range, then an event there; both show as cards and rows on a phone and as tables on a wide screen', async () => {
  const siteName = `Heron Lake picnic field ${Date.now() % 10_000}`;
  const eventName = `Winter sprint ${Date.now() % 10_000}`;
  const phone = await newPage(browser(), 'phone');
  const p = phone.page;
  await signIn(p, DEMO_USERS.lead);

  await goToNav(p, 'survey');
  await byTestId(p, 'sites-title').waitFor();
  await p.getByText(DEMO_SITE).first().waitFor();
  await byTestId(p, 'sites-new').click();
  await byTestId(p, 'site-name').fill(siteName);
  await byTestId(p, 'site-lat').fill('95');
  await expect.poll(() => byTestId(p, 'site-lat-error').innerText()).toContain('between -90 and 90');
  await byTestId(p, 'site-lat').fill('abc');
  await expect.poll(() => byTestId(p, 'site-lat-error').innerText()).toContain('enter a number');
  await byTestId(p, 'site-lat').fill('44.90123');
  await byTestId(p, 'site-lon').fill('-93.41');
  await byTestId(p, 'site-rules').fill('No stakes in the lawn\nOut by 20:00');
  await screenshot(p, 'site-form', 'phone');
  await byTestId(p, 'site-save').click();
  await byTestId(p, 'site-detail-title').waitFor();
  expect(await byTestId(p, 'site-detail-title').innerText()).toBe(siteName);
  expect(await byTestId(p, 'site-ref-figures').innerText()).toContain('44.901230, -93.410000');
  await p.getByText('No stakes in the lawn').waitFor();
  await screenshot(p, 'site-detail', 'phone');

  await goToNav(p, 'events');
  await byTestId(p, 'events-new').click();
  await byTestId(p, 'event-name').fill(eventName);
  await byTestId(p, 'event-starts').fill('2027-01-16');
  await byTestId(p, 'event-ends').fill('2027-01-15');
  await byTestId(p, `event-site`).locator('[role="radio"]', { hasText: siteName }).click();
  await byTestId(p, 'event-save').click();
  await expect.poll(() => byTestId(p, 'event-ends-error').innerText()).toContain('end on or after');
  await byTestId(p, 'event-ends').fill('2027-01-17');
  await byTestId(p, 'event-notes').fill('Two stations: 40 m and 20 m.');
  await screenshot(p, 'event-form', 'phone');
  await byTestId(p, 'event-save').click();
  await byTestId(p, 'event-detail-title').waitFor();
  expect(await byTestId(p, 'event-detail-title').innerText()).toBe(eventName);
  expect(await byTestId(p, 'event-site-link').innerText()).toContain(siteName);
  for (const part of ['survey', 'plan', 'review', 'sheets']) await byTestId(p, `event-go-${part}`).waitFor();
  await screenshot(p, 'event-detail', 'phone');

  // Edit keeps the id and changes the name.
  await byTestId(p, 'event-edit').click();
  await byTestId(p, 'event-name').fill(`${eventName} (edited)`);
  await byTestId(p, 'event-save').click();
  await expect.poll(() => byTestId(p, 'event-detail-title').innerText()).toBe(`${eventName} (edited)`);

  await goToNav(p, 'events');
  await byTestId(p, 'events-cards').getByText(`${eventName} (edited)`).waitFor();
  await screenshot(p, 'events-cards', 'phone');

  // The same lists at a wide viewport are tables; an event opens beside the list.
  const wide = await newPage(browser(), 'wide');
  const w = wide.page;
  await signIn(w, DEMO_USERS.lead);
  await byTestId(w, 'events-table').getByText(`${eventName} (edited)`).waitFor();
  await screenshot(w, 'events-table', 'wide');
  await byTestId(w, 'events-table').getByText(`${eventName} (edited)`).click();
  await byTestId(w, 'event-detail-title').waitFor();
  await byTestId(w, 'events-compact').waitFor();
  await screenshot(w, 'event-two-pane', 'wide');
  await goToNav(w, 'survey');
  await byTestId(w, 'sites-table').getByText(siteName).waitFor();
  await screenshot(w, 'sites-table', 'wide');

  // A scout reads the new event but cannot create or edit one.
  const scout = await newPage(browser(), 'phone');
  await signIn(scout.page, DEMO_USERS.scout);
  await byTestId(scout.page, 'events-cards').getByText(`${eventName} (edited)`).click();
  await byTestId(scout.page, 'event-detail-title').waitFor();
  expect(await byTestId(scout.page, 'event-edit').count()).toBe(0);
  expect(await byTestId(scout.page, 'event-go-plan').count()).toBe(0);

  for (const x of [phone, wide, scout]) {
    expect(x.errors).toEqual([]);
    await x.context.close();
  }
});

it('units chosen in Settings apply to lengths shown (12.5 m shows as 41 ft; 1 ft = 0.3048 m, NIST HB 44)', async () => {
  const { context, page } = await newPage(browser(), 'phone');
  await signIn(page, DEMO_USERS.scout);
  await goToNav(page, 'settings');
  expect(await byTestId(page, 'settings-units-example').innerText()).toBe('12.5 m');
  await byTestId(page, 'settings-units-imperial').click();
  await expect.poll(() => byTestId(page, 'settings-units-example').innerText()).toBe('41 ft');
  await page.reload();
  await expect.poll(() => byTestId(page, 'settings-units-example').innerText()).toBe('41 ft');
  await screenshot(page, 'settings', 'phone');
  await context.close();
});
