import sharp from 'sharp';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { deltaE2000 } from '../../lib/color';
import { artifactPath, browserAvailable, signedInPage, useBrowser } from '../support/browser';
import { api, baseUrl, signInAs } from '../support/http';
import { BACK_SHAPE, BELLY_SHAPE, labToRgb8, twoTonePng, uploadPhoto } from '../support/photos';

type Lab = { l: number; a: number; b: number };
const STANDARD = { back: { l: 38, a: 10, b: 22 }, belly: { l: 62, a: 12, b: 30 } };
const BATCH = { back: { l: 40, a: 8.5, b: 20 }, belly: { l: 61, a: 13, b: 31.5 } };
const ZONES = [{ name: 'back', shape: BACK_SHAPE }, { name: 'belly', shape: BELLY_SHAPE }];
const VIEWPORTS = [{ width: 1280, height: 900 }, { width: 390, height: 844 }];

// A QC photo with the batch's bait on the left half and the retained standard on the right, each
// with its back over its belly: the two compared under the same light.
async function sideBySidePng(left: { back: Lab; belly: Lab }, right: { back: Lab; belly: Lab }, w = 400, h = 240) {
  const px = Buffer.alloc(w * h * 3);
  for (let y = 0; y < h; y++)
    for (let x = 0; x < w; x++) {
      const side = x < w / 2 ? left : right;
      px.set(labToRgb8(y < h / 2 ? side.back : side.belly), (y * w + x) * 3);
    }
  return sharp(px, { raw: { width: w, height: h, channels: 3 } }).png().toBuffer();
}

// Presses the mouse at `from`, moves to `to` in steps and leaves the button down: the shape is
// being drawn. Fractions of the drawing surface.
async function startDrag(page: Page, from: [number, number], to: [number, number]) {
  const surface = page.getByRole('img', { name: /Drawing surface/ });
  await surface.scrollIntoViewIfNeeded();
  const box = (await surface.boundingBox())!;
  await page.mouse.move(box.x + from[0] * box.width, box.y + from[1] * box.height);
  await page.mouse.down();
  await page.mouse.move(box.x + to[0] * box.width, box.y + to[1] * box.height, { steps: 6 });
}
async function draw(page: Page, zone: string, from: [number, number], to: [number, number]) {
  await page.getByRole('group', { name: 'Zone to mark' }).getByRole('button', { name: new RegExp(`^${zone.replace(/[()]/g, '\\$&')}( ✓)?$`) }).click();
  await startDrag(page, from, to);
  await page.mouse.up();
}

describe.runIf(browserAvailable())('browser: the sampler warns live; the batch form marks the retained standard in frame', () => {
  const browser = useBrowser();

  for (const viewport of VIEWPORTS) {
    it(`warns "reaches into another colour" while the region is drawn, and stops when it is redrawn inside one colour (${viewport.width} px)`, async () => {
      const page = await signedInPage(browser(), baseUrl(), 'maker@demo.test', viewport);
      const name = `Live check ${viewport.width} ${Date.now().toString(36)}`;
      const match = await page.request.post(`${baseUrl()}/api/matches`, { data: { name, zones: ['back', 'belly'] }, headers: { origin: baseUrl() } });
      expect(match.status()).toBe(201);
      await page.goto(`${baseUrl()}/matches/${(await match.json()).id}`);
      await page.getByTestId('photo-input').setInputFiles({ name: 'reference.png', mimeType: 'image/png', buffer: await twoTonePng(labToRgb8(STANDARD.back), labToRgb8(STANDARD.belly), 400, 240) });
      await page.getByRole('img', { name: /Drawing surface/ }).waitFor({ timeout: 20_000 });
      const warning = page.getByTestId('other-warning-back');

      // Inside the back only: no warning.
      await draw(page, 'back', [0.15, 0.1], [0.85, 0.4]);
      await expect.poll(() => page.getByRole('list', { name: 'Live preview' }).textContent()).toMatch(/preview L\* 3\d/);
      expect(await warning.count()).toBe(0);

      // Dragged down over the line into the belly: the warning shows before the button is let go.
      await page.getByRole('group', { name: 'Zone to mark' }).getByRole('button', { name: /^back/ }).click();
      await startDrag(page, [0.15, 0.1], [0.85, 0.75]);
      await warning.waitFor({ timeout: 5_000 });
      expect(await warning.textContent()).toMatch(/reaches into another colour \(about \d+ % of it\)/);
      await page.screenshot({ path: artifactPath(`sampler-live-warning-${viewport.width}.png`) });
      await page.mouse.up();
      await warning.waitFor();
      // The label on the photo says it too.
      await page.getByTestId('sampler-stage').getByText('back ▲ two colours').waitFor();

      // Redrawn inside one colour, the warning goes.
      await draw(page, 'back', [0.15, 0.1], [0.85, 0.4]);
      await warning.waitFor({ state: 'detached', timeout: 5_000 });
    });
  }

  for (const viewport of VIEWPORTS) {
    it(`logs a batch with the retained standard marked in frame and shows its ΔE00 ± in the readout and on the sheet (${viewport.width} px)`, async () => {
      // Through the API: a match whose pour is approved as the standard.
      const maker = await signInAs('maker@demo.test', 'pourproof-demo', `10.73.${viewport.width % 250}.1`);
      const lead = await signInAs('lead@demo.test', 'pourproof-demo', `10.73.${viewport.width % 250}.2`);
      const name = `In-frame craw ${viewport.width} ${Date.now().toString(36)}`;
      const matchId = (await api('/api/matches', { cookie: maker, body: { name, zones: ['back', 'belly'] } })).body.id as string;
      const std = (c: typeof STANDARD) => twoTonePng(labToRgb8(c.back), labToRgb8(c.belly), 400, 240);
      const ref = await uploadPhoto(maker, await std(STANDARD), 'reference');
      expect((await api(`/api/matches/${matchId}/target`, { cookie: maker, body: { photoId: ref.id, zones: ZONES } })).status).toBe(200);
      const shot = await uploadPhoto(maker, await std(STANDARD), 'pour');
      // A standard needs a recipe to be signed off.
      const pigment = ((await api('/api/colorants', { cookie: maker })).body as { id: string; kind: string; unit: string }[]).find((c) => c.kind === 'pigment' && c.unit === 'drops')!;
      const recipe = [{ zone: 'back', colorantId: pigment.id, amount: 6, unit: 'drops' }, { zone: 'belly', colorantId: pigment.id, amount: 2, unit: 'drops' }];
      const pour = await api(`/api/matches/${matchId}/pours`, { cookie: maker, body: { photoId: shot.id, recipe, zones: ZONES } });
      expect(pour.status).toBe(201);
      expect((await api(`/api/pours/${pour.body.id}/submit`, { cookie: maker, body: {} })).status).toBe(200);
      expect((await api(`/api/pours/${pour.body.id}/sign-off`, { cookie: lead, body: { decision: 'approved' } })).status).toBe(200);

      const page = await signedInPage(browser(), baseUrl(), 'maker@demo.test', viewport);
      await page.goto(`${baseUrl()}/matches/${matchId}?log=batch`);
      const form = page.getByRole('form', { name: 'Log a batch' });
      await form.waitFor({ timeout: 15_000 });
      await form.getByLabel('Batch size (cups)').fill('2');
      await page.getByTestId('photo-input').setInputFiles({ name: 'qc.png', mimeType: 'image/png', buffer: await sideBySidePng(BATCH, STANDARD) });
      await page.getByRole('img', { name: /Drawing surface/ }).waitFor({ timeout: 20_000 });
      await form.getByLabel(/The retained standard lies in this photo too/).check();
      const zoneButtons = page.getByRole('group', { name: 'Zone to mark' });
      await zoneButtons.getByRole('button', { name: /^back \(retained standard\)/ }).waitFor();
      // The batch's bait on the left, the retained standard on the right.
      await draw(page, 'back', [0.06, 0.1], [0.44, 0.4]);
      await draw(page, 'belly', [0.06, 0.6], [0.44, 0.9]);
      await draw(page, 'back (retained standard)', [0.56, 0.1], [0.94, 0.4]);
      await draw(page, 'belly (retained standard)', [0.56, 0.6], [0.94, 0.9]);
      expect(await page.locator('[data-testid^="other-warning-"]').count()).toBe(0);
      await form.screenshot({ path: artifactPath(`batch-form-in-frame-${viewport.width}.png`) });
      await page.getByRole('button', { name: 'Measure and log batch' }).click();

      const result = page.getByRole('region', { name: 'Batch result' });
      await result.waitFor({ timeout: 20_000 });
      const lines = await result.getByText('Against the reference in frame:').locator('..').allTextContents();
      expect(lines).toHaveLength(2);
      for (const [i, zone] of (['back', 'belly'] as const).entries()) {
        const m = lines[i]!.match(/(\d+\.\d\d) ± (\d+\.\d\d) ΔE00/);
        expect(m, lines[i]).not.toBeNull();
        // Flat colours: the in-frame ΔE00 is the one between the two sides' colours (culori's
        // CIEDE2000 on the Lab we painted), within 8-bit rounding and the measuring ±.
        const truth = deltaE2000(STANDARD[zone], BATCH[zone]);
        expect(Math.abs(Number(m![1]) - truth)).toBeLessThanOrEqual(Math.max(0.3, Number(m![2])));
        expect(Number(m![2])).toBeGreaterThan(0);
      }
      // Every ΔE00 of the readout carries its ±.
      expect(await result.getByLabel(/^plus or minus \d/).count()).toBe(2);
      // …and so does every colour: the batch's and the standard's Lab in the batch readout, the
      // target's on the stage, the pour's and the target's in the pour's readout.
      expect((await result.textContent())!.match(/Batch L\* [\d.−-]+ a\* [\d.−-]+ b\* [\d.−-]+ ± \d+\.\d\d ΔE00/g)).toHaveLength(2);
      expect((await page.getByRole('list', { name: 'Target colours' }).textContent())!.match(/± \d+\.\d\d ΔE00/g)).toHaveLength(2);
      const pourText = (await page.getByRole('region', { name: 'Pour #1 against the target' }).textContent())!;
      expect(pourText.match(/Pour L\* [^·]+ ± \d+\.\d\d ΔE00 · target L\* [^±]+ ± \d+\.\d\d ΔE00/g)).toHaveLength(2);
      // The standard's colour carries its own ±; ΔL*, ΔC*, ΔH* and the flake coverage carry theirs,
      // in the batch readout and in the pour's.
      const resultText = (await result.textContent())!;
      expect(resultText.match(/standard L\* [\d.−-]+ a\* [\d.−-]+ b\* [\d.−-]+ ± \d+\.\d\d ΔE00/g)).toHaveLength(2);
      const components = /ΔL\* [+−]\d+\.\d\d ± \d+\.\d\d · ΔC\* [+−]\d+\.\d\d ± \d+\.\d\d · ΔH\* [+−]\d+\.\d\d ± \d+\.\d\d/g;
      expect(resultText.match(components)).toHaveLength(2);
      expect(pourText.match(components)).toHaveLength(2);
      expect(resultText.match(/Flake \d+\.\d % ± \d+\.\d % · standard \d+\.\d % ± \d+\.\d %/g)).toHaveLength(2);
      expect(pourText.match(/Flake \d+\.\d % ± \d+\.\d % \(target \d+\.\d % ± \d+\.\d %\)/g)).toHaveLength(2);
      await page.screenshot({ path: artifactPath(`batch-in-frame-result-${viewport.width}.png`), fullPage: true });

      await page.waitForURL(/[?&]batch=/); // the router names the new batch just after the result shows
      const batchId = new URL(page.url()).searchParams.get('batch');
      expect(batchId).toBeTruthy();
      const stored = await api(`/api/batches/${batchId}`, { cookie: maker });
      expect(stored.body.zones.every((z: { inFrame: unknown }) => z.inFrame !== null)).toBe(true);

      await result.getByRole('link', { name: 'Batch sheet' }).click();
      await page.waitForURL(/\/batches\/[^/]+\/sheet$/);
      const qc = page.getByRole('table', { name: 'Colour check per zone' });
      await qc.waitFor();
      expect(await qc.getByRole('columnheader', { name: 'ΔE00 vs retained standard in frame' }).count()).toBe(1);
      const rows = await qc.getByRole('row').allTextContents();
      // Header + back + belly; each zone row has two ΔE00 ± figures (standard, retained standard in frame).
      expect(rows).toHaveLength(3);
      for (const r of rows.slice(1)) expect(r.match(/\d+\.\d\d ± \d+\.\d\d/g)).toHaveLength(2);
      // The standard's colour on the sheet's swatches carries its ±.
      expect((await page.locator('section[aria-labelledby="sheet-layout"]').textContent())!.match(/L\* [\d.−-]+ a\* [\d.−-]+ b\* [\d.−-]+ ± \d+\.\d\d ΔE00/g)).toHaveLength(2);
      await page.screenshot({ path: artifactPath(`batch-sheet-in-frame-${viewport.width}.png`), fullPage: true });
    });
  }
});
