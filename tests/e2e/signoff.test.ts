import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { SAFETY_CAUTIONS } from '../../lib/batches/safetyCautions';
import { artifactPath, browserAvailable, useBrowser } from '../support/browser';
import { api, baseUrl, signInAs, signUpShop } from '../support/http';
import { waitForMail } from '../support/mail';
import { BACK_SHAPE, BELLY_SHAPE, labToRgb8, twoTonePng, uploadPhoto } from '../support/photos';

const TARGET = { back: labToRgb8({ l: 38, a: 10, b: 22 }), belly: labToRgb8({ l: 62, a: 12, b: 30 }) };
const POUR = { back: labToRgb8({ l: 39, a: 9.5, b: 21 }), belly: labToRgb8({ l: 61.5, a: 12.5, b: 30.5 }) };
const ZONES = [{ name: 'back', shape: BACK_SHAPE }, { name: 'belly', shape: BELLY_SHAPE }];
// 1 cup = 231 in³ × 16.387064 mL/in³ ÷ 16 (NIST Handbook 44, Appendix C).
const ML_PER_CUP = (231 * 25.4 ** 3) / 1000 / 16;
const esc = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
const name = `Sheet craw ${Date.now().toString(36)}`;

// The maker's side through the API: a match with a target, one pour with a
// recipe, submitted for sign-off with a note.
async function makerSubmitsAPour() {
  const maker = await signInAs('maker@demo.test', 'pourproof-demo', '10.72.0.1');
  const colorants = (await api('/api/colorants', { cookie: maker })).body as any[];
  const pigment = colorants.find((c) => c.kind === 'pigment' && c.unit === 'drops');
  const flake = colorants.find((c) => c.kind === 'flake' && c.unit === 'tsp');
  const mold = ((await api('/api/molds', { cookie: maker })).body as any[]).find((m) => m.cavities === 4);
  const matchId = (await api('/api/matches', { cookie: maker, body: { name, zones: ['back', 'belly'] } })).body.id as string;
  const ref = await uploadPhoto(maker, await twoTonePng(TARGET.back, TARGET.belly, 400, 240), 'reference');
  expect((await api(`/api/matches/${matchId}/target`, { cookie: maker, body: { photoId: ref.id, zones: ZONES } })).status).toBe(200);
  const photo = await uploadPhoto(maker, await twoTonePng(POUR.back, POUR.belly, 400, 240), 'pour');
  const recipe = [
    { zone: 'back', colorantId: pigment.id, amount: 6, unit: 'drops' },
    { zone: 'back', colorantId: flake.id, amount: 0.25, unit: 'tsp' },
    { zone: 'belly', colorantId: pigment.id, amount: 2, unit: 'drops' },
  ];
  const pour = await api(`/api/matches/${matchId}/pours`, { cookie: maker, body: { photoId: photo.id, recipe, moldId: mold.id, batchCups: 1, tempF: 340, zones: ZONES } });
  expect(pour.status).toBe(201);
  expect((await api(`/api/pours/${pour.body.id}/submit`, { cookie: maker, body: { note: 'shot under the bench lamp' } })).status).toBe(200);
  return { matchId, pourId: pour.body.id as string, mold: mold as { id: string; name: string; cavities: number; mlPerCavity: number } };
}

async function signIn(page: Page, email: string) {
  await page.goto(`${baseUrl()}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill('pourproof-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/matches$/);
}

describe.runIf(browserAvailable())('browser: sign-off, a production batch and its printed sheet', () => {
  const browser = useBrowser();

  it('the lead approves from the e-mail link, logs a passing batch and prints its sheet', async () => {
    const { matchId, pourId, mold } = await makerSubmitsAPour();
    const mail = await waitForMail('lead@demo.test', new RegExp(`Sign-off requested: ${esc(name)}, pour #1`));
    const link = mail.text.match(/https?:\/\/\S+\/matches\/\S+/)?.[0];
    expect(link).toContain(`/matches/${matchId}?pour=${pourId}`);

    // At the bench on a phone: the whole lead's path at 390 px.
    const context = await browser().newContext({ viewport: { width: 390, height: 844 }, extraHTTPHeaders: { 'x-forwarded-for': '10.72.0.2' } });
    const page = await context.newPage();
    await signIn(page, 'lead@demo.test');
    await page.goto(link!);
    await page.getByRole('heading', { name, level: 1 }).waitFor();
    const signoff = page.getByRole('region', { name: 'Sign-off of pour #1' });
    await signoff.getByText('Waiting for a lead’s sign-off').waitFor();
    await expect.poll(() => signoff.getByRole('list', { name: 'Sign-off history' }).textContent()).toContain('shot under the bench lamp');

    // Sending back needs a comment: the form says so and sends nothing.
    await signoff.getByRole('button', { name: 'Send back for rework' }).click();
    await signoff.getByRole('alert').filter({ hasText: 'Say what to change' }).waitFor();
    await signoff.screenshot({ path: artifactPath('signoff-decide-390.png') });
    expect((await api(`/api/pours/${pourId}`, { cookie: await signInAs('viewer@demo.test', 'pourproof-demo', '10.72.0.3') })).body.status).toBe('submitted');

    await signoff.getByLabel('Comment').fill('Good for the spring run');
    await signoff.getByRole('button', { name: 'Approve as standard' }).click();
    await signoff.getByText('this pour is the match’s standard').waitFor({ timeout: 15_000 });
    // The history list refreshes on its own after the decision: wait for it.
    const history = signoff.getByRole('list', { name: 'Sign-off history' });
    await expect.poll(() => history.textContent(), { timeout: 15_000 }).toMatch(/Pour #1 approved as standard by Lem Tashgar/);
    expect(await history.textContent()).toContain('Good for the spring run');
    await page.getByRole('button', { name: 'Approve as standard' }).waitFor({ state: 'detached' });

    // A batch of the same colours as the standard passes.
    await page.getByRole('button', { name: 'Log a batch' }).click();
    const form = page.getByRole('form', { name: 'Log a batch' });
    await form.getByLabel('Batch size (cups)').fill('2');
    expect(await form.getByRole('combobox', { name: /^Mold/ }).inputValue()).toBe(mold.id); // starts from the standard's mold
    // Yield = floor(2 cups × 236.588 mL ÷ (4 × 9.5 mL)) shots × 4 cavities (demo sprue allowance 0 mL).
    const baits = Math.floor((2 * ML_PER_CUP) / (mold.cavities * mold.mlPerCavity)) * mold.cavities;
    await form.getByText(`use the mold’s yield: ${baits} baits (`).waitFor();
    await form.getByLabel('Actual bait count (optional)').fill(String(baits - 2));
    await page.getByTestId('photo-input').setInputFiles({ name: 'batch.png', mimeType: 'image/png', buffer: await twoTonePng(POUR.back, POUR.belly, 400, 240) });
    await page.getByRole('img', { name: /Drawing surface/ }).waitFor({ timeout: 20_000 });
    await form.screenshot({ path: artifactPath('batch-form-390.png') });
    await page.getByRole('button', { name: 'Measure and log batch' }).click();
    const result = page.getByRole('region', { name: 'Batch result' });
    await result.waitFor({ timeout: 20_000 });
    const text = (await result.textContent())!;
    expect(text).toContain('pass');
    expect(text).toContain('Every zone is within the tolerance of 2.0 ΔE00');
    const labels = await result.locator('[aria-label^="ΔE00 "]').evaluateAll((els) => els.map((e) => e.getAttribute('aria-label')!));
    const figures = labels.map((l) => Number(l.slice('ΔE00 '.length)));
    expect(figures).toHaveLength(2);
    for (const f of figures) expect(f).toBeLessThanOrEqual(0.5); // the same pixels as the standard, within measuring noise
    await page.getByRole('figure', { name: /ΔE00 per zone across batches/ }).locator('svg[data-chart]').first().waitFor();
    await page.waitForURL(/[?&]batch=/);
    await page.screenshot({ path: artifactPath('signoff-match-390.png'), fullPage: true });
    await page.setViewportSize({ width: 1280, height: 900 });
    await page.screenshot({ path: artifactPath('signoff-match-1280.png'), fullPage: true });

    // The printable sheet: each side of the laminate scaled to its own cup (2 cups split evenly: 1 + 1),
    // molds with yield, temperature, cautions.
    await result.getByRole('link', { name: 'Batch sheet' }).click();
    await page.waitForURL(/\/batches\/[^/]+\/sheet$/);
    const sheet = page.getByRole('article', { name: 'Batch sheet' });
    await sheet.getByRole('heading', { name, level: 1 }).waitFor();
    const sheetText = (await sheet.textContent())!;
    expect(sheetText).toContain('6 drops'); // back: 6 drops per cup × 1 cup
    expect(sheetText).toContain('0.25 tsp (¼ tsp)'); // 0.25 tsp per cup × 1 cup
    expect(sheetText).toContain('2 drops'); // belly: 2 drops per cup × 1 cup
    expect(sheetText).toContain('340 °F');
    expect(sheetText).toContain('(171 °C)'); // (340 − 32) × 5/9 = 171.1
    expect(sheetText).toContain(`${mold.name} (this batch)`);
    expect(sheetText).toContain('Laminate: back over belly');
    for (const c of SAFETY_CAUTIONS) expect(sheetText).toContain(c);
    await page.screenshot({ path: artifactPath('batch-sheet-screen-1280.png'), fullPage: true });

    await page.emulateMedia({ media: 'print' });
    expect(await page.getByRole('navigation', { name: 'Main' }).isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Print' }).isVisible()).toBe(false);
    const pdf = artifactPath('batch-sheet.pdf');
    await page.pdf({ path: pdf, format: 'A4' });
    expect(fs.readFileSync(pdf).subarray(0, 5).toString()).toBe('%PDF-');
    const png = spawnSync('pdftoppm', ['-png', '-r', '110', '-f', '1', '-l', '1', '-singlefile', pdf, artifactPath('batch-sheet-page1')], { encoding: 'utf8' });
    if (png.error) console.warn(`[signoff] pdftoppm not available (${png.error.message}); kept artifacts/batch-sheet.pdf only`);
    else expect(png.status, png.stderr).toBe(0);
    await page.emulateMedia({ media: 'screen' });
    await page.setViewportSize({ width: 390, height: 844 });
    await page.screenshot({ path: artifactPath('batch-sheet-screen-390.png'), fullPage: true });

    // The standards page at phone width shows the new standard with its last batch.
    await page.goto(`${baseUrl()}/standards`);
    const card = page.getByRole('article', { name });
    await card.waitFor();
    const cardText = (await card.textContent())!;
    expect(cardText).toContain('2.0 ΔE00');
    expect(cardText).toMatch(/Last batch✓ ?pass/);
    expect(cardText).toContain('6 drops Pigment');
    await page.screenshot({ path: artifactPath('standards-390.png'), fullPage: true });
    await page.goto(`${baseUrl()}/batches`);
    await page.getByRole('list', { name: 'Recent batches' }).getByText(name).first().waitFor();
    await page.screenshot({ path: artifactPath('batches-390.png'), fullPage: true });

    // GET /api/batches lists the team's batches, and no other team's.
    const mine = await api('/api/batches', { cookie: await signInAs('viewer@demo.test', 'pourproof-demo', '10.72.0.4') });
    expect(mine.status).toBe(200);
    const ours = (mine.body as any[]).filter((b) => b.matchId === matchId);
    expect(ours).toHaveLength(1);
    expect(ours[0]).toMatchObject({ matchName: name, pass: true, cups: 2, baits: baits - 2, baitsExpected: baits });
    const stranger = await signUpShop('Other bench');
    expect((await api('/api/batches', { cookie: stranger.cookie })).body).toEqual([]);
    await context.close();
  });
});
