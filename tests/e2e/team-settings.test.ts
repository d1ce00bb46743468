import Database from 'better-sqlite3';
import { describe, expect, inject, it } from 'vitest';
import { browserAvailable, signedUpPage, useBrowser } from '../support/browser';
import { baseUrl, uniqueEmail } from '../support/http';

describe.runIf(browserAvailable())('browser: a new shop signs up and sets its defaults', () => {
  const browser = useBrowser();

  it('signs up through the page, saves shop settings, and new matches take the default tolerance', async () => {
    const page = await signedUpPage(browser(), baseUrl(), { teamName: 'Settings test shop', name: 'Sam Owner', email: uniqueEmail('settings') });

    await page.goto(`${baseUrl()}/team`);
    const form = page.getByRole('form', { name: 'Team settings' });
    await form.getByLabel('Default tolerance (ΔE00)').fill('-1');
    await form.getByRole('button', { name: 'Save settings' }).click();
    await expect.poll(() => form.getByRole('alert').first().textContent()).toMatch(/more than 0/);
    await form.getByLabel('Default tolerance (ΔE00)').fill('2.5');
    await form.getByLabel('Drops per mL (your dropper)').fill('24');
    await form.getByRole('button', { name: 'Save settings' }).click();
    await expect.poll(() => form.getByRole('status').textContent()).toMatch(/saved/);

    const res = await page.request.post(`${baseUrl()}/api/matches`, { data: { name: 'Uses the default', zones: ['back'] }, headers: { origin: baseUrl() } });
    expect(res.status()).toBe(201);
    expect((await res.json()).tolerance).toBe(2.5);
  });

  it("shows a refused role as the form's own error, not a server error", async () => {
    const email = uniqueEmail('demoted');
    const page = await signedUpPage(browser(), baseUrl(), { teamName: 'Demoted shop', name: 'Dee Owner', email });
    await page.goto(`${baseUrl()}/team`);
    const form = page.getByRole('form', { name: 'Team settings' });
    await form.getByLabel('Default tolerance (ΔE00)').fill('3');
    // Made a maker behind the page's back (as a second owner could), then saves.
    const raw = new Database(inject('dbFile'));
    raw.prepare("update memberships set role = 'maker' where user_id = (select id from users where email = ?)").run(email);
    raw.close();
    await form.getByRole('button', { name: 'Save settings' }).click();
    await expect.poll(() => form.getByRole('status').textContent()).toMatch(/needs the owner role or above; you are maker/);
  });
});
