import { describe, expect, it } from 'vitest';
import { artifactPath, browserAvailable, signedInPage, useBrowser } from '../support/browser';
import { api, baseUrl } from '../support/http';
import { twoTonePng } from '../support/photos';
import { COLOURS, shopWithStandard } from '../support/shop';

describe.runIf(browserAvailable())('a run of three molds, planned on a phone and logged as a batch', () => {
  const browser = useBrowser();

  it('plans the run at 390 px, logs it, and the stock goes down and the sheet shows cost per bait', async () => {
    const s = await shopWithStandard();
    const add = async (body: object) => (await api('/api/molds', { cookie: s.cookie, body })).body;
    const craw = await add({ name: 'Craw 2 cavity', bodyStyle: 'craw', cavities: 2, mlPerCavity: 12, thickness: 'thick' });
    const finesse = await add({ name: 'Finesse 6 cavity', bodyStyle: 'finesse worm', cavities: 6, mlPerCavity: 3.2, thickness: 'thin' });
    const page = await signedInPage(browser(), baseUrl(), s.shop.email, { width: 390, height: 844 }, s.shop.password);

    // The shop's sprue allowance: 2 mL a shot.
    await page.goto(`${baseUrl()}/team`);
    await page.getByLabel('Sprue allowance per shot (mL)').fill('2');
    await page.getByRole('button', { name: 'Save settings' }).click();
    await page.getByText('Settings saved.').waitFor();

    await page.goto(`${baseUrl()}/plan?standard=${s.match.id}`);
    await page.getByRole('heading', { name: 'Run planner' }).waitFor();
    await page.getByLabel(`Shots of ${s.mold.name}`).fill('5');
    await page.getByRole('checkbox', { name: /Craw 2 cavity/ }).check();
    await page.getByLabel('Shots of Craw 2 cavity').fill('3');
    await page.getByRole('checkbox', { name: /Finesse 6 cavity/ }).check();
    await page.getByLabel('Shots of Finesse 6 cavity').fill('4');
    const plan = page.getByRole('region', { name: 'Run plan' });
    // Σ cavities × shots = 4×5 + 2×3 + 6×4 = 50 baits; Σ shots × (cavities × mL + 2 mL sprue)
    // = 5×40 + 3×26 + 4×21.2 = 362.8 mL; each side half of it, rounded up to ¼ cup: 1 cup each.
    await plan.getByText('50', { exact: true }).waitFor();
    const planText = (await plan.textContent())!;
    expect(planText).toContain('362.8 mL');
    expect(planText).toContain('back: 1 cup (236.6 mL)');
    expect(planText).toContain('6 drops Pigment, moss');
    // What the run takes from the shelf and costs, before anything is poured.
    expect(planText).toContain('Pigment, moss: 8 drops of 200 on the shelf'); // 6 drops × 1 cup + 2 drops × 1 cup
    expect(planText).toMatch(/per bait/);
    expect(planText).toContain('No cost in the library for Flake, black');
    await page.getByRole('note', { name: 'Safety caution' }).waitFor();
    await page.screenshot({ path: artifactPath('run-plan-390.png'), fullPage: true });

    const before = (await api(`/api/colorants/${s.pigment.id}/stock`, { cookie: s.cookie })).body.stock;
    await plan.getByRole('link', { name: 'Log as batch' }).click();
    const form = page.getByRole('form', { name: 'Log a batch' });
    await form.waitFor();
    expect(await form.getByLabel('Batch size (cups)').inputValue()).toBe('2');
    await form.getByText('Craw 2 cavity: 3 shots → 6 baits').waitFor();
    await page.getByTestId('photo-input').setInputFiles({ name: 'batch.png', mimeType: 'image/png', buffer: await twoTonePng(COLOURS.back, COLOURS.belly, 400, 240) });
    await page.getByRole('img', { name: /Drawing surface/ }).waitFor({ timeout: 20_000 });
    await form.screenshot({ path: artifactPath('run-plan-batch-form-390.png') });
    await page.getByRole('button', { name: 'Measure and log batch' }).click();
    const result = page.getByRole('region', { name: 'Batch result' });
    await result.waitFor({ timeout: 20_000 });
    expect(await result.textContent()).toMatch(/per bait/);

    // Stock went down by the batch's doses: 6 drops (back, 1 cup) + 2 drops (belly, 1 cup).
    const after = (await api(`/api/colorants/${s.pigment.id}/stock`, { cookie: s.cookie })).body.stock;
    expect(after).toBeCloseTo(before - 8, 9);
    await page.goto(`${baseUrl()}/colorants`);
    await page.getByRole('button', { name: 'Stock of Pigment, moss' }).click();
    const panel = page.getByRole('region', { name: 'Stock' });
    await panel.getByText(`${Number(after.toFixed(3))} drops`).first().waitFor();
    expect(await panel.textContent()).toContain('batch');
    await page.screenshot({ path: artifactPath('run-plan-stock-390.png'), fullPage: true });

    // The sheet: each side's cups, the plan, cost per bait.
    const batchId = (await api(`/api/matches/${s.match.id}/batches`, { cookie: s.cookie })).body[0].id;
    await page.goto(`${baseUrl()}/batches/${batchId}/sheet`);
    const sheet = page.getByRole('article', { name: 'Batch sheet' });
    await sheet.getByRole('heading', { name: 'Run plan' }).waitFor();
    const sheetText = (await sheet.textContent())!;
    expect(sheetText).toContain('Cost per bait');
    expect(sheetText).toMatch(/USD 0\.\d+/);
    expect(sheetText).toContain('No cost in the library for: Flake, black');
    expect(sheetText).toContain('its own cup: 1 cup (236.6 mL)');
    for (const m of [s.mold.name, craw.name, finesse.name]) expect(sheetText).toContain(m);
    await page.screenshot({ path: artifactPath('run-plan-sheet-390.png'), fullPage: true });
  });
});
