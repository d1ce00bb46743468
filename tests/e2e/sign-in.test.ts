import { describe, expect, it } from 'vitest';
import { artifactPath, browserAvailable, useBrowser } from '../support/browser';
import { baseUrl } from '../support/http';

describe.runIf(browserAvailable())('browser: sign in as the demo maker', () => {
  const browser = useBrowser();

  it('signs in, sees the matches list, signs out', async () => {
    const context = await browser().newContext({ viewport: { width: 390, height: 844 } });
    const page = await context.newPage();
    await page.goto(`${baseUrl()}/matches`);
    // Signed out: the proxy sends us to the sign-in page.
    await page.waitForURL(/\/sign-in$/);
    await page.getByLabel('E-mail').fill('maker@demo.test');
    await page.getByLabel('Password').fill('wrong password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.getByRole('alert').first().textContent()).toMatch(/wrong/i);
    await page.getByLabel('Password').fill('pourproof-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/matches$/);
    const table = page.getByRole('table', { name: 'Matches' });
    await table.waitFor();
    expect(await table.textContent()).toContain('Dusk crawdad');
    await page.screenshot({ path: artifactPath('matches-390.png'), fullPage: true });
    // At phone width the sections, the member's name and Sign out sit in the menu.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('button', { name: 'Menu' }).click();
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/\/sign-in$/);
    await page.goto(`${baseUrl()}/matches`);
    await page.waitForURL(/\/sign-in$/);
    await context.close();
  });
});
