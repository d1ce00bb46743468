import { describe, expect, it } from 'vitest';
import { artifactPath, browserAvailable, signedInPage, useBrowser } from '../support/browser';
import { baseUrl } from '../support/http';

// The Matches list is rendered on the server (TanStack Table's core runs there): sorting and
// filtering travel in the address, so they survive a reload and work at any width.
describe.runIf(browserAvailable())('browser: the Matches list sorts and filters through the address', () => {
  const browser = useBrowser();

  for (const viewport of [{ width: 1280, height: 900 }, { width: 390, height: 844 }]) {
    it(`sorts by name both ways, searches and filters by status at ${viewport.width} px`, async () => {
      const page = await signedInPage(browser(), baseUrl(), 'maker@demo.test', viewport);
      await page.goto(`${baseUrl()}/matches`);
      const table = page.getByRole('table', { name: 'Matches' });
      await table.waitFor();
      const names = async () => (await table.locator('tbody tr td:first-child').allTextContents()).map((t) => t.trim());
      const all = await names();
      expect(all.length).toBeGreaterThan(1);
      // Other tests add matches to the shop while this runs, so the order is checked on the demo
      // shop's own three (scripts/seed/seed-demo.ts), whose names need no natural-number order.
      const DEMO = ['Cinder minnow', 'Dusk crawdad', 'Pond ghost'];
      const demoOrder = async () => (await names()).filter((n) => DEMO.includes(n));

      // The Match header: A→Z, then Z→A (TanStack's order for text), each in the address.
      await table.getByRole('link', { name: /^Match/ }).click();
      await page.waitForURL(/[?&]sort=name\b/);
      await expect.poll(demoOrder).toEqual(DEMO);
      expect(await table.getByRole('columnheader', { name: /^Match/ }).getAttribute('aria-sort')).toBe('ascending');
      await expect.poll(() => table.getByRole('link', { name: /^Match/ }).getAttribute('href')).toMatch(/sort=-name\b/);
      await table.getByRole('link', { name: /^Match/ }).click();
      await page.waitForURL(/[?&]sort=-name\b/);
      await expect.poll(demoOrder).toEqual([...DEMO].reverse());
      // A reload keeps the sort: it lives in the address.
      await page.reload();
      await table.waitFor();
      expect(await demoOrder()).toEqual([...DEMO].reverse());

      // Search: the server filters by name or notes; the sort stays.
      const word = 'Dusk';
      await page.getByRole('searchbox', { name: 'Search matches' }).fill(word);
      await page.waitForURL(new RegExp(`[?&]q=${encodeURIComponent(word)}`));
      await expect.poll(async () => {
        const shown = await names();
        return shown.includes('Dusk crawdad') && !shown.includes('Pond ghost');
      }).toBe(true);
      expect(page.url()).toMatch(/[?&]sort=-name\b/);
      await page.getByRole('searchbox', { name: 'Search matches' }).fill('no match is called this');
      await expect.poll(() => page.getByText('No match fits this search.').isVisible()).toBe(true);
      await page.getByRole('searchbox', { name: 'Search matches' }).fill('');

      // Status: every row shown carries the status asked for.
      await page.getByLabel('Filter by status').selectOption('open');
      await page.waitForURL(/[?&]status=open\b/);
      await expect.poll(async () => {
        const statuses = await table.locator('tbody tr td:nth-child(2)').allTextContents();
        return statuses.length > 0 && statuses.every((s) => /open/.test(s));
      }).toBe(true);
      await page.screenshot({ path: artifactPath(`matches-list-${viewport.width}.png`), fullPage: true });
      await page.context().close();
    });
  }
});
