import { afterAll, beforeAll } from 'vitest';
import fs from 'node:fs';
import path from 'node:path';
import { type Browser, type Page, chromium } from 'playwright-core';

export const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

// Browser tests are mandatory under CI=true: a missing browser fails the run.
// Elsewhere they are skipped with a note when Chromium is not installed.
export function browserAvailable(): boolean {
  const ok = fs.existsSync(CHROMIUM);
  if (!ok && process.env.CI === 'true') throw new Error(`Chromium not found at ${CHROMIUM}; CI needs it (apt-get install -y chromium)`);
  if (!ok) console.warn(`[browser tests] skipped: no Chromium at ${CHROMIUM}`);
  return ok;
}

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: CHROMIUM,
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
  });
}

export const ARTIFACTS = path.resolve(__dirname, '../../artifacts');
export function artifactPath(name: string): string {
  fs.mkdirSync(ARTIFACTS, { recursive: true });
  return path.join(ARTIFACTS, name);
}

// A fresh browser context signed in through the sign-in page.
export async function signedInPage(browser: Browser, baseUrl: string, email: string, viewport = { width: 1280, height: 900 }, password = 'pourproof-demo') {
  const page = await (await browser.newContext({ viewport })).newPage();
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/matches$/);
  return page;
}

// Drags a rectangle over the sampler's drawing surface, in fractions of it.
export async function dragOnSurface(page: Page, from: [number, number], to: [number, number]) {
  const box = (await page.getByRole('img', { name: /Drawing surface/ }).boundingBox())!;
  await page.mouse.move(box.x + from[0] * box.width, box.y + from[1] * box.height);
  await page.mouse.down();
  await page.mouse.move(box.x + ((from[0] + to[0]) / 2) * box.width, box.y + ((from[1] + to[1]) / 2) * box.height, { steps: 3 });
  await page.mouse.move(box.x + to[0] * box.width, box.y + to[1] * box.height, { steps: 3 });
  await page.mouse.up();
}


// One Chromium for the tests of a describe block: launched before, closed after.
export function useBrowser(): () => Browser {
  let browser: Browser | undefined;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });
  return () => {
    if (!browser) throw new Error('the browser is not launched yet');
    return browser;
  };
}

// A new shop signed up through the sign-up page, at phone width by default.
export async function signedUpPage(browser: Browser, baseUrl: string, shop: { teamName: string; name: string; email: string }, viewport = { width: 390, height: 844 }) {
  const page = await (await browser.newContext({ viewport })).newPage();
  await page.goto(`${baseUrl}/sign-up`);
  await page.getByLabel('Shop name').fill(shop.teamName);
  await page.getByLabel('Your name').fill(shop.name);
  await page.getByLabel('E-mail').fill(shop.email);
  await page.getByLabel('Password').fill('a long password');
  await page.getByRole('button', { name: 'Create shop' }).click();
  await page.waitForURL(/\/matches$/);
  return page;
}
