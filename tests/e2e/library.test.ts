import { describe, expect, it } from 'vitest';
import { artifactPath, browserAvailable, signedInPage, signedUpPage, useBrowser } from '../support/browser';
import { baseUrl, uniqueEmail } from '../support/http';

describe.runIf(browserAvailable())('browser: a new shop fills its colorant and mold libraries', () => {
  const browser = useBrowser();

  it('adds a pigment and a flake at 390 px, edits one, and sees them in the table', async () => {
    const page = await signedUpPage(browser(), baseUrl(), { teamName: 'Library test shop', name: 'Robin Owner', email: uniqueEmail('library') });

    // An empty library opens the form straight away.
    await page.goto(`${baseUrl()}/colorants`);
    const form = page.getByRole('form', { name: 'Add a colorant' });
    await form.getByLabel('Name').fill('Pigment, moss green');
    await form.getByLabel('Kind').selectOption('pigment');
    await expect.poll(() => form.getByLabel('Dosed in').inputValue()).toBe('drops');
    await form.getByLabel('Cost per drop').fill('0.02');
    await form.getByLabel('Stock (drops)').fill('480');
    await form.getByRole('button', { name: 'Add colorant' }).click();
    await expect.poll(() => form.getByRole('status').textContent()).toMatch(/Added “Pigment, moss green”/);
    const table = page.getByRole('table', { name: 'Colorant library' });
    const pigmentRow = table.getByRole('row', { name: /Pigment, moss green/ });
    await expect.poll(() => pigmentRow.textContent()).toMatch(/liquid pigment.*0\.02 per drop.*480 drops/);

    // A flake needs its size: the field appears with the kind, and the form says what is missing.
    await form.getByLabel('Name').fill('Flake, gold 0.015 in');
    await form.getByLabel('Kind').selectOption('flake');
    await expect.poll(() => form.getByLabel('Dosed in').inputValue()).toBe('tsp');
    await form.getByRole('button', { name: 'Add colorant' }).click();
    await expect.poll(() => form.getByRole('alert').first().textContent()).toMatch(/flake needs its size in inches/);
    await form.getByLabel('Flake size (in)').fill('0.015');
    await form.getByLabel('Flake colour').fill('gold');
    await form.getByLabel('Cost per tsp').fill('0.3');
    await form.getByRole('button', { name: 'Add colorant' }).click();
    const flakeRow = table.getByRole('row', { name: /Flake, gold 0\.015 in/ });
    await expect.poll(() => flakeRow.textContent()).toMatch(/flake.*0\.015 in, gold.*0\.30 per tsp/);
    await page.screenshot({ path: artifactPath('library-colorant-form-390.png'), fullPage: true });

    // Edit the pigment's stock in the panel above the table.
    await pigmentRow.getByRole('button', { name: 'Edit Pigment, moss green' }).click();
    const edit = page.getByRole('form', { name: 'Edit Pigment, moss green' });
    await edit.getByLabel('Stock (drops)').fill('450');
    await edit.getByRole('button', { name: 'Save changes' }).click();
    await expect.poll(() => pigmentRow.textContent()).toMatch(/450 drops/);

    await page.evaluate(() => window.scrollTo(0, 0));
    await page.screenshot({ path: artifactPath('library-colorants-390.png'), fullPage: true });
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow, 'the page itself does not scroll sideways at 390 px').toBeLessThanOrEqual(0);
    // On a phone each row is a card: the table itself does not scroll sideways, and every figure
    // carries its column's name.
    const tableOverflow = await table.evaluate((t) => t.parentElement!.scrollWidth - t.parentElement!.clientWidth);
    expect(tableOverflow, 'the colorant table fits the phone without sideways scrolling').toBeLessThanOrEqual(0);
    const stockLabel = await pigmentRow.getByRole('cell').nth(3).evaluate((td) => getComputedStyle(td, '::before').content);
    expect(stockLabel).toBe('"Stock"');

    // The mold library: add one, archive it with the in-place confirm.
    await page.goto(`${baseUrl()}/molds`);
    const moldForm = page.getByRole('form', { name: 'Add a mold' });
    await moldForm.getByLabel('Name').fill('Craw 4 in, 2 cavity');
    await moldForm.getByLabel('Body style').fill('craw');
    await moldForm.getByLabel('Length (in)').fill('4');
    await moldForm.getByLabel('Cavities').fill('2');
    await moldForm.getByLabel('Plastisol per cavity (mL)').fill('7.5');
    await moldForm.getByLabel('Body thickness').selectOption('thin');
    await moldForm.getByRole('button', { name: 'Add mold' }).click();
    const moldRow = page.getByRole('table', { name: 'Mold library' }).getByRole('row', { name: /Craw 4 in, 2 cavity/ });
    await expect.poll(() => moldRow.textContent()).toMatch(/craw.*4 in.*2.*7\.5 mL.*thin/);
    await page.screenshot({ path: artifactPath('library-molds-390.png'), fullPage: true });
    await moldRow.getByRole('button', { name: 'Archive Craw 4 in, 2 cavity' }).click();
    await moldRow.getByRole('button', { name: 'Yes, archive' }).click();
    await expect.poll(() => page.getByRole('table', { name: 'Mold library' }).getByRole('row').count()).toBe(1);
  });

  it('shows makers the tables only', async () => {
    const page = await signedInPage(browser(), baseUrl(), 'maker@demo.test', { width: 390, height: 844 });
    await page.goto(`${baseUrl()}/colorants`);
    await expect.poll(() => page.getByRole('table', { name: 'Colorant library' }).getByRole('row').count()).toBeGreaterThan(1);
    expect(await page.getByRole('button', { name: 'Add a colorant' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /^Edit / }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /^Archive / }).count()).toBe(0);
  });
});
