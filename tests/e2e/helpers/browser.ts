import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

/*
 * Debian's Chromium driven by playwright-core (never `npx playwright install`: nothing may download).
 * launch() gives every browser a fresh temporary profile; each viewport gets its own context, so
 * localStorage (the session) never leaks between roles.
 */

export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
const ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];

export const VIEWPORTS = {
  phone: { width: 390, height: 844 },
  wide: { width: 1280, height: 800 },
} as const;
export type ViewportName = keyof typeof VIEWPORTS;

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: CHROMIUM_PATH, args: ARGS, headless: true });
}

export async function newPage(browser: Browser, viewport: ViewportName): Promise<{ context: BrowserContext; page: Page; errors: string[] }> {
  const context = await browser.newContext({ viewport: VIEWPORTS[viewport], deviceScaleFactor: 1, locale: 'en-US', timezoneId: 'UTC' });
  const page = await context.newPage();
  // Uncaught errors in the page fail the test that looks at them (see expectNoPageErrors).
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  return { context, page, errors };
}

export const SCREENSHOT_DIR = path.resolve(process.cwd(), 'tests/.artifacts/screenshots');

/** tests/.artifacts/screenshots/<name>-<viewport>.png */
export async function screenshot(page: Page, name: string, viewport: ViewportName): Promise<string> {
  await mkdir(SCREENSHOT_DIR, { recursive: true });
  const file = path.join(SCREENSHOT_DIR, `${name}-${viewport}.png`);
  // Let fonts and the last render settle so the picture shows what a person sees.
  await page.evaluate(() => document.fonts.ready);
  await page.screenshot({ path: file, fullPage: false });
  return file;
}

/** Find by testID (react-native-web renders it as data-testid). */
export const byTestId = (page: Page, id: string) => page.locator(`[data-testid="${id}"]`);

/** One browser per test file, launched before its tests and closed after them. */
export function browserForFile(beforeAll: (fn: () => Promise<void>) => void, afterAll: (fn: () => Promise<void>) => void): () => Browser {
  let browser: Browser | undefined;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });
  return () => {
    if (!browser) throw new Error('the browser is not launched yet (call inside a test)');
    return browser;
  };
}
