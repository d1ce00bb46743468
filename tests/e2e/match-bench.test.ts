import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { artifactPath, browserAvailable, useBrowser, dragOnSurface as drag, signedInPage } from '../support/browser';
import { baseUrl } from '../support/http';
import { labToRgb8, twoTonePng } from '../support/photos';

const TARGET = { back: labToRgb8({ l: 36, a: 12, b: 24 }), belly: labToRgb8({ l: 63, a: 14, b: 32 }) };
const POURS = [
  { back: labToRgb8({ l: 42, a: 9, b: 19 }), belly: labToRgb8({ l: 58, a: 16, b: 35 }) },
  { back: labToRgb8({ l: 37, a: 11.5, b: 23 }), belly: labToRgb8({ l: 62, a: 14.5, b: 32.5 }) },
];

async function markZones(page: Page) {
  await page.getByRole('button', { name: /^back/ }).click();
  await drag(page, [0.15, 0.12], [0.85, 0.4]);
  await page.getByRole('button', { name: /^belly/ }).click();
  await drag(page, [0.15, 0.6], [0.85, 0.88]);
}

describe.runIf(browserAvailable())('browser: a whole match on the bench', () => {
  const browser = useBrowser();

  it('creates a match, samples the reference, adds two pours and sees ΔE00 and the chart', async () => {
    const page = await signedInPage(browser(), baseUrl(), 'maker@demo.test', { width: 1280, height: 900 });

    await page.getByRole('button', { name: 'New match' }).click();
    const name = `Browser craw ${Date.now().toString(36)}`;
    await page.getByRole('form', { name: 'New match' }).getByLabel('Name').fill(name);
    await page.getByRole('button', { name: 'Create match' }).click();
    await page.waitForURL(/\/matches\/[^/]+$/);
    await page.getByRole('heading', { name, level: 1 }).waitFor();

    await page.getByTestId('photo-input').setInputFiles({ name: 'reference.png', mimeType: 'image/png', buffer: await twoTonePng(TARGET.back, TARGET.belly, 400, 240) });
    await page.getByRole('img', { name: /Drawing surface/ }).waitFor({ timeout: 20_000 });
    await markZones(page);
    await expect.poll(() => page.getByRole('list', { name: 'Live preview' }).textContent()).toMatch(/preview L\* 3\d/);
    await page.getByRole('button', { name: 'Measure and save target' }).click();
    await page.getByRole('list', { name: 'Target colours' }).waitFor({ timeout: 20_000 });

    const pigment = (await page.request.get(`${baseUrl()}/api/colorants`).then((r) => r.json())).find((c: { kind: string }) => c.kind === 'pigment');
    for (const [i, colours] of POURS.entries()) {
      await page.getByRole('button', { name: 'New pour' }).click();
      const form = page.getByRole('form', { name: 'New pour' });
      // Before the first pour the form offers a starting recipe; after it, the next-pour hint.
      if (i === 0) await form.getByRole('button', { name: 'Suggest a starting recipe' }).waitFor();
      else await form.getByRole('region', { name: 'Next pour' }).waitFor({ timeout: 20_000 });
      // The second pour starts from the first one's recipe, ready to adjust.
      if (i === 0) await form.getByRole('button', { name: 'Add a recipe line' }).click();
      else expect(await form.getByLabel('Line 1 colorant').inputValue()).toBe(pigment.id);
      await form.getByLabel('Line 1 colorant').selectOption(pigment.id);
      await form.getByLabel('Line 1 amount').fill(String(6 - i));
      await form.getByLabel('Batch size (cups)').fill('1');
      await form.getByLabel('Pour / injection temperature (°F)').fill('335');
      await page.getByTestId('photo-input').setInputFiles({ name: `pour-${i + 1}.png`, mimeType: 'image/png', buffer: await twoTonePng(colours.back, colours.belly, 400, 240) });
      await page.getByRole('img', { name: /Drawing surface/ }).waitFor({ timeout: 20_000 });
      // The shapes start from the reference's: no need to draw again.
      await page.getByRole('button', { name: 'Measure and save pour' }).click();
      await page.getByRole('heading', { name: `Pour #${i + 1} against the target` }).waitFor({ timeout: 20_000 });
    }
    // The hint sits in the form of the next pour; "use these doses" fills the lines with it.
    const latestId = (await page.request.get(`${baseUrl()}${new URL(page.url()).pathname.replace('/matches/', '/api/matches/')}`).then((r) => r.json())).pours.at(-1).id;
    const advice = await page.request.get(`${baseUrl()}/api/pours/${latestId}/suggestion`).then((r) => r.json());
    await page.getByRole('button', { name: 'New pour' }).click();
    const next = page.getByRole('form', { name: 'New pour' });
    await next.getByRole('region', { name: 'Next pour' }).waitFor({ timeout: 20_000 });
    const change = advice.zones.flatMap((z: { zone: string; changes: { colorantId: string; to: number }[] }) => z.changes.map((c) => ({ zone: z.zone, ...c }))).find((c: { to: number }) => c.to > 0);
    if (change) {
      await next.getByRole('button', { name: 'Use these doses' }).click();
      const amounts = await next.getByLabel(/Line \d+ amount/).evaluateAll((els) => els.map((e) => Number((e as HTMLInputElement).value)));
      expect(amounts).toContain(change.to);
    }
    await page.getByRole('button', { name: 'Cancel' }).click();
    const figures = await page.getByRole('region', { name: 'Pour #2 against the target' }).textContent();
    expect(figures).toMatch(/ΔE00/);
    expect(figures).toMatch(/ΔL\*/);
    await page.getByRole('figure', { name: 'ΔE00 per zone across pours' }).locator('svg[data-chart]').first().waitFor();
    expect(await page.getByRole('list', { name: 'Pours' }).getByRole('button').count()).toBe(2);
    await page.screenshot({ path: artifactPath('match-bench-1280.png'), fullPage: true });
    await page.setViewportSize({ width: 390, height: 844 });
    await page.screenshot({ path: artifactPath('match-bench-390.png'), fullPage: true });
  });
});
