import fs from 'node:fs';
import { chromium } from 'playwright-core';

const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

export type PageWeight = { key: string; label: string; path: string; onLoadKB: number; scrolledKB: number; files: number; scripts: { url: string; bytes: number }[] };
export type PageWeights = { pages: PageWeight[]; skipped?: string };

/**
 * What a phone downloads of JavaScript for a page, cold: a fresh Chromium context (empty cache)
 * at 390 × 844, signed in with the caller's cookie, loads the page from `next start` (which
 * gzips its answers) and waits until the network is quiet; the figure is the sum of the bytes on
 * the wire (`responseBodySize`: compressed, headers not counted) of every script response. A
 * second figure keeps going: it scrolls to the foot of the page, so chunks loaded only when a
 * part comes into view (lazy charts, forms) are counted too. kB = 1000 bytes.
 */
export async function measurePageWeights(base: string, cookie: string, pages: { key: string; label: string; path: string }[]): Promise<PageWeights> {
  if (!fs.existsSync(CHROMIUM)) return { pages: [], skipped: `no Chromium at ${CHROMIUM}` };
  const browser = await chromium.launch({ executablePath: CHROMIUM, headless: true, args: ['--no-sandbox', '--disable-gpu'] });
  const name = cookie.slice(0, cookie.indexOf('='));
  const value = cookie.slice(cookie.indexOf('=') + 1);
  try {
    const out: PageWeight[] = [];
    for (const p of pages) {
      const context = await browser.newContext({ viewport: { width: 390, height: 844 }, deviceScaleFactor: 3, isMobile: true, hasTouch: true });
      await context.addCookies([{ name, value, url: base }]);
      const page = await context.newPage();
      const scripts: Promise<{ url: string; bytes: number }>[] = [];
      page.on('requestfinished', (req) => {
        if (req.resourceType() === 'script') scripts.push(req.sizes().then((s) => ({ url: new URL(req.url()).pathname, bytes: s.responseBodySize })));
      });
      const sum = async () => (await Promise.all(scripts)).reduce((a, b) => a + b.bytes, 0);
      await page.goto(`${base}${p.path}`, { waitUntil: 'networkidle' });
      const onLoad = await sum();
      // Scroll to the foot in screen-high steps, letting whatever comes into view load.
      for (let i = 0; i < 40; i++) {
        const atEnd = await page.evaluate(() => {
          window.scrollBy(0, window.innerHeight);
          return window.scrollY + window.innerHeight >= document.documentElement.scrollHeight - 2;
        });
        await page.waitForTimeout(150);
        if (atEnd) break;
      }
      await settle(page, scripts);
      out.push({ key: p.key, label: p.label, path: p.path, onLoadKB: onLoad / 1000, scrolledKB: (await sum()) / 1000, files: scripts.length, scripts: await Promise.all(scripts) });
      await context.close();
    }
    return { pages: out };
  } finally {
    await browser.close();
  }
}

// Waits until no script has been requested for a second (lazy parts start loading a moment after
// they come into view).
async function settle(page: import('playwright-core').Page, scripts: unknown[]) {
  let seen = -1;
  for (let i = 0; i < 30 && seen !== scripts.length; i++) {
    seen = scripts.length;
    await page.waitForTimeout(1000);
  }
  await page.waitForLoadState('networkidle');
}
