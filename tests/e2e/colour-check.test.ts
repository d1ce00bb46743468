import { describe, expect, it } from 'vitest';
import { artifactPath, browserAvailable, dragOnSurface, useBrowser, signedInPage } from '../support/browser';
import { baseUrl } from '../support/http';
import { labToRgb8, twoTonePng } from '../support/photos';

describe.runIf(browserAvailable())('browser: the colour check page', () => {
  const browser = useBrowser();

  it('measures a drawn region of a photo and compares two typed colours', async () => {
    const page = await signedInPage(browser(), baseUrl(), 'viewer@demo.test', { width: 1100, height: 900 });
    await page.goto(`${baseUrl()}/calculator`);

    const top = labToRgb8({ l: 45, a: -20, b: 25 });
    await page.getByTestId('check-photo-input').setInputFiles({ name: 'swatch.png', mimeType: 'image/png', buffer: await twoTonePng(top, [220, 210, 200], 300, 200) });
    await page.getByRole('img', { name: /Drawing surface/ }).waitFor();
    await dragOnSurface(page, [0.2, 0.1], [0.8, 0.4]);
    await page.getByRole('button', { name: 'Measure', exact: true }).click();
    const readout = page.getByLabel('Measured colour');
    await readout.waitFor({ timeout: 15_000 });
    const text = (await readout.textContent()) ?? '';
    // The top half was written as L* 45, a* −20, b* 25 (rounded to 8-bit sRGB).
    const m = text.match(/L\* (-?[\d.]+) a\* (-?[\d.]+) b\* (-?[\d.]+)/)!;
    expect(Number(m[1])).toBeCloseTo(45, 0);
    expect(Number(m[2])).toBeCloseTo(-20, 0);
    expect(Number(m[3])).toBeCloseTo(25, 0);
    // Flake coverage with its ± (coverageUncertainty): a flat colour has none, to within a little.
    expect(text).toMatch(/Flake\s*\d+\.\d % ± \d+\.\d % of the region/);
    expect(text).toMatch(/Glare/);

    await page.getByLabel('Target (L* a* b*, or hex)').fill('50 2.6772 -79.7751');
    await page.getByLabel('Trial (L* a* b*, or hex)').fill('50 0 -82.7485');
    await page.getByRole('button', { name: 'Compare', exact: true }).click();
    // Sharma, Wu & Dalal (2005), Table 1, pair 1: ΔE00 = 2.0425.
    await expect.poll(() => page.getByLabel('Difference').textContent()).toMatch(/2\.04/);
    await page.screenshot({ path: artifactPath('colour-check-1100.png'), fullPage: true });
  });
});
