import sharp from 'sharp';
import type { Browser, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { artifactPath, browserAvailable, dragOnSurface as drag, useBrowser } from '../support/browser';
import { api, baseUrl, signInAs } from '../support/http';
import { labToRgb8 } from '../support/photos';

const TARGET = { back: labToRgb8({ l: 37, a: 11, b: 23 }), belly: labToRgb8({ l: 62, a: 13, b: 31 }) };
const POUR = { back: labToRgb8({ l: 39, a: 10, b: 21 }), belly: labToRgb8({ l: 60, a: 14, b: 33 }) };
const PHONE = { viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true, deviceScaleFactor: 2 };
const DESK = { viewport: { width: 1280, height: 900 } };
const name = `Thumb craw ${Date.now().toString(36)}`;

// A two-tone bait with a mid-grey card (sRGB 119, about L* 50) lying at the right.
async function baitWithCard(c: { back: [number, number, number]; belly: [number, number, number] }, w = 400, h = 240): Promise<Buffer> {
  const px = Buffer.alloc(w * h * 3);
  for (let y = 0; y < h; y++) {
    for (let x = 0; x < w; x++) {
      const card = x >= w * 0.8 && x < w * 0.98 && y >= h * 0.4 && y < h * 0.6;
      px.set(card ? [119, 119, 119] : y < h / 2 ? c.back : c.belly, (y * w + x) * 3);
    }
  }
  return sharp(px, { raw: { width: w, height: h, channels: 3 } }).png().toBuffer();
}

async function open(browser: Browser, email: string, ctx: typeof PHONE | typeof DESK, ip: string): Promise<Page> {
  const context = await browser.newContext({ ...ctx, extraHTTPHeaders: { 'x-forwarded-for': ip } });
  const page = await context.newPage();
  await page.goto(`${baseUrl()}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill('pourproof-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/matches$/);
  return page;
}

const focusedLabel = (page: Page) =>
  page.evaluate(() => {
    const el = document.activeElement as HTMLInputElement | null;
    return el?.getAttribute('aria-label') ?? el?.labels?.[0]?.textContent ?? el?.tagName ?? '';
  });

// Nothing on the page may be wider than the phone's screen.
const noSideScroll = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth + 1);

describe.runIf(browserAvailable())('browser: the bench without traps, on a phone and at a desk', () => {
  const browser = useBrowser();

  it('a maker at 390 px: menu, camera, draft reference kept, thumb and keyboard marking, doses as said, no sign-off without a recipe', { timeout: 240_000 }, async () => {
    const page = await open(browser(), 'maker@demo.test', PHONE, '10.75.0.1');

    // 12. The navigation is a menu with the member's name and role; no sideways scroll.
    const nav = page.getByRole('navigation', { name: 'Main' });
    expect(await nav.getByRole('link', { name: 'Photos' }).isVisible()).toBe(false);
    await nav.getByRole('button', { name: 'Menu' }).click();
    await nav.getByRole('link', { name: 'Photos' }).waitFor();
    const menuText = (await nav.textContent())!;
    expect(menuText).toContain('Mika Feldspar');
    expect(menuText).toMatch(/· maker/);
    for (const label of ['Matches', 'Photos', 'Colorants', 'Molds', 'Standards', 'Batches', 'Team', 'Calculator']) {
      const box = (await nav.getByRole('link', { name: label, exact: true }).boundingBox())!;
      expect(box.x + box.width, label).toBeLessThanOrEqual(390);
      expect(box.height, label).toBeGreaterThanOrEqual(44);
    }
    await page.screenshot({ path: artifactPath('traps-menu-390.png') });
    await nav.getByRole('button', { name: 'Close menu' }).click();
    // 13. A skip link comes first.
    await page.reload();
    await page.getByRole('button', { name: 'New match' }).waitFor();
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe('Skip to content');

    // 10. Enter in the name does not create the match; focus went to the name when the form opened.
    await page.getByRole('button', { name: 'New match' }).click();
    const form = page.getByRole('form', { name: 'New match' });
    await expect.poll(() => focusedLabel(page)).toMatch(/^Name/);
    await page.keyboard.type(name);
    await page.keyboard.press('Enter');
    await expect.poll(() => focusedLabel(page)).toBe('Zone 1');
    expect(page.url()).toMatch(/\/matches$/);
    await form.getByRole('button', { name: 'Create match' }).click();
    await page.waitForURL(/\/matches\/[^/?#]+$/);
    await page.getByRole('heading', { name, level: 1 }).waitFor();
    expect(await noSideScroll(page)).toBe(true);

    // 11. The camera beside the dropzone.
    const camera = page.getByTestId('camera-input');
    expect(await camera.getAttribute('capture')).toBe('environment');
    await page.getByText('Take a photo with the camera').waitFor();
    await page.screenshot({ path: artifactPath('traps-match-new-390.png'), fullPage: true });

    // 3. The uploaded reference survives a reload.
    await page.getByTestId('photo-input').setInputFiles({ name: 'reference.png', mimeType: 'image/png', buffer: await baitWithCard(TARGET) });
    const surface = page.getByRole('img', { name: /Drawing surface/ });
    await surface.waitFor({ timeout: 20_000 });
    // 4. Nothing to measure until every zone is marked.
    const measure = page.getByRole('button', { name: 'Measure and save target' });
    expect(await measure.isDisabled()).toBe(true);
    await page.getByText('Mark every zone before measuring. Not marked yet: back, belly.').waitFor();
    await expect.poll(() => page.evaluate(async (u) => (await (await fetch(u)).json()).draft?.photoId ?? null, page.url().replace('/matches/', '/api/matches/'))).not.toBeNull();
    await page.reload();
    await surface.waitFor({ timeout: 20_000 });

    // 13. Zoom: a true read-out, 44 px buttons, wheel and pinch.
    const readout = page.getByTestId('zoom-readout');
    expect(await readout.textContent()).toMatch(/^Zoom: fit \(\d+ %\)$/);
    for (const label of ['Zoom in', 'Zoom out']) {
      const box = (await page.getByRole('button', { name: label }).boundingBox())!;
      expect(box.width, label).toBeGreaterThanOrEqual(44);
      expect(box.height, label).toBeGreaterThanOrEqual(44);
    }
    await page.getByRole('button', { name: 'Zoom in' }).click();
    await expect.poll(() => readout.textContent()).toMatch(/^Zoom: \d+ %$/);
    await page.getByRole('button', { name: 'Fit' }).click();
    const box = (await surface.boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.wheel(0, -300);
    await expect.poll(() => readout.textContent()).toMatch(/^Zoom: \d+ %$/);
    await page.getByRole('button', { name: 'Fit' }).click();
    const cdp = await page.context().newCDPSession(page);
    const cx = box.x + box.width / 2;
    const cy = box.y + box.height / 2;
    await cdp.send('Input.dispatchTouchEvent', { type: 'touchStart', touchPoints: [{ x: cx - 20, y: cy, id: 1 }, { x: cx + 20, y: cy, id: 2 }] });
    await cdp.send('Input.dispatchTouchEvent', { type: 'touchMove', touchPoints: [{ x: cx - 50, y: cy, id: 1 }, { x: cx + 50, y: cy, id: 2 }] });
    await cdp.send('Input.dispatchTouchEvent', { type: 'touchMove', touchPoints: [{ x: cx - 80, y: cy, id: 1 }, { x: cx + 80, y: cy, id: 2 }] });
    await cdp.send('Input.dispatchTouchEvent', { type: 'touchEnd', touchPoints: [] });
    await expect.poll(() => readout.textContent()).toMatch(/^Zoom: \d+ %$/);
    await page.getByRole('button', { name: 'Fit' }).click();

    // 13. Keyboard marking: Enter places "back" in the middle, arrows move it up, Shift+arrows resize, announced.
    await page.getByRole('button', { name: /^back/ }).click();
    await surface.focus();
    await page.keyboard.press('Enter');
    const said = page.getByTestId('sampler-announce');
    await expect.poll(() => said.textContent()).toBe('back: left 35 %, top 40 %, 30 % wide, 20 % high');
    for (let i = 0; i < 25; i++) await page.keyboard.press('ArrowUp');
    await page.keyboard.press('Shift+ArrowRight');
    await expect.poll(() => said.textContent()).toBe('back: left 35 %, top 15 %, 31 % wide, 20 % high');
    // Belly and the grey card by thumb.
    await page.getByRole('button', { name: /^belly/ }).click();
    await drag(page, [0.15, 0.65], [0.7, 0.9]);
    await page.getByRole('button', { name: /^Grey card/ }).click();
    await drag(page, [0.83, 0.44], [0.95, 0.56]);
    await page.getByLabel("Grey card's nominal L* (optional)").fill('50');
    expect(await measure.isDisabled()).toBe(false);
    await page.screenshot({ path: artifactPath('traps-target-marked-390.png'), fullPage: true });
    await measure.click();
    await page.getByRole('list', { name: 'Target colours' }).waitFor({ timeout: 20_000 });

    // 3. Photos links the reference to its match.
    await page.goto(`${baseUrl()}/photos`);
    const recent = page.getByRole('list', { name: 'Recent photos' });
    await recent.getByRole('link', { name }).first().waitFor();
    expect(await recent.getByText('(reference)').count()).toBeGreaterThan(0);
    expect(await noSideScroll(page)).toBe(true);
    await page.screenshot({ path: artifactPath('traps-photos-390.png') });
    // A photo is reused as a reference: it opens on the match's sampler as a draft, and can be let go.
    const card = recent.getByRole('listitem').filter({ has: page.getByRole('link', { name }) }).first();
    await card.getByLabel('Use as the reference of').selectOption({ label: name });
    await card.getByRole('button', { name: 'Use', exact: true }).click();
    await page.waitForURL(/\/matches\/[^/?#]+#target$/);
    await page.getByRole('heading', { name, level: 1 }).waitFor();
    await surface.waitFor({ timeout: 20_000 });
    await page.getByText('This photo is kept with the match until you save the target.').waitFor();
    await page.getByRole('button', { name: 'Use another photo' }).click();
    // The match has its target, so letting the draft go closes the reference panel.
    await page.getByRole('button', { name: 'Add another reference photo' }).waitFor();
    expect(await page.getByTestId('photo-input').count()).toBe(0);

    // 2. Doses typed as said; the card carried over; a pour saved without it says the light was not corrected.
    const colorants = (await page.request.get(`${baseUrl()}/api/colorants`).then((r) => r.json())) as any[];
    const pigment = colorants.find((c) => c.kind === 'pigment' && c.unit === 'drops');
    const pearl = colorants.find((c) => c.kind === 'pearl' && c.unit === 'tsp');
    await page.getByRole('button', { name: 'New pour' }).click();
    const pourForm = page.getByRole('form', { name: 'New pour' });
    await pourForm.getByRole('button', { name: 'Add a recipe line' }).click();
    await pourForm.getByRole('button', { name: 'Add a recipe line' }).click();
    await pourForm.getByLabel('Line 1 colorant').selectOption(pigment.id);
    await pourForm.getByLabel('Line 1 amount').fill('abc');
    await pourForm.getByLabel('Line 2 colorant').selectOption(pearl.id);
    await pourForm.getByLabel('Line 2 amount').fill('¼');
    await pourForm.getByText('reads as 0.25 tsp (¼ tsp)').waitFor();
    await pourForm.getByLabel('Batch size (cups)').fill('1 1/2');
    await pourForm.getByTestId('photo-input').setInputFiles({ name: 'pour.png', mimeType: 'image/png', buffer: await baitWithCard(POUR) });
    await surface.waitFor({ timeout: 20_000 });
    await pourForm.getByText(/Grey card marked where it sat on the last photo, nominal L\* 50/).waitFor();
    await page.getByRole('button', { name: 'Measure and save pour' }).click();
    await pourForm.getByRole('alert').filter({ hasText: '"abc" is not an amount' }).waitFor();
    await pourForm.getByLabel('Line 1 amount').fill('1 1/4');
    await pourForm.getByText('reads as 1.25 drops').waitFor();
    await pourForm.screenshot({ path: artifactPath('traps-pour-form-390.png') });
    await page.getByRole('button', { name: /^Grey card/ }).click();
    await page.getByRole('button', { name: 'Clear grey card' }).click();
    await page.getByRole('button', { name: 'Measure and save pour' }).click();
    const compare = page.getByRole('region', { name: 'Pour #1 against the target' });
    await compare.waitFor({ timeout: 20_000 });
    expect(await compare.getByText('Light not corrected: the figure mixes light and colour').count()).toBe(2);
    // The page shows the comparison before the address names the new pour: wait for that too.
    await page.waitForURL(/[?&]pour=/);
    const matchId = page.url().match(/\/matches\/([^/?#]+)/)![1]!;
    const pourId = new URL(page.url()).searchParams.get('pour')!;
    const res = await page.request.get(`${baseUrl()}/api/pours/${pourId}`);
    expect(res.status()).toBe(200);
    const saved = await res.json();
    expect(saved.recipe.map((l: any) => [l.unit, l.amount])).toEqual([['drops', 1.25], ['tsp', 0.25]]);
    expect(saved.batchCups).toBeCloseTo(1.5, 12);
    expect(saved.light).toEqual({ corrected: false, referenceCorrected: true });

    // 1. A second pour with no recipe lines cannot be submitted, and says why before the press.
    await page.getByRole('button', { name: 'New pour' }).click();
    await pourForm.getByRole('button', { name: 'Remove line 2' }).click();
    await pourForm.getByRole('button', { name: 'Remove line 1' }).click();
    await pourForm.getByTestId('photo-input').setInputFiles({ name: 'pour-2.png', mimeType: 'image/png', buffer: await baitWithCard(POUR) });
    await surface.waitFor({ timeout: 20_000 });
    await page.getByRole('button', { name: 'Measure and save pour' }).click();
    const signoff = page.getByRole('region', { name: 'Sign-off of pour #2' });
    await signoff.waitFor({ timeout: 20_000 });
    const submit = signoff.getByRole('button', { name: 'Submit for sign-off' });
    await signoff.getByText('This pour has no recipe lines, so it cannot become the standard').waitFor();
    expect(await submit.isDisabled()).toBe(true);
    expect(await submit.getAttribute('aria-describedby')).toBeTruthy();
    await signoff.screenshot({ path: artifactPath('traps-no-recipe-390.png') });

    // Pour #1 has a recipe: it goes to sign-off. The jump bar reaches every part.
    await page.getByRole('list', { name: 'Pours' }).getByRole('button', { name: /^#1/ }).click();
    const signoff1 = page.getByRole('region', { name: 'Sign-off of pour #1' });
    await signoff1.getByRole('button', { name: 'Submit for sign-off' }).click();
    await signoff1.getByText('Waiting for a lead’s sign-off').waitFor({ timeout: 15_000 });
    const jump = page.getByRole('navigation', { name: 'On this page' });
    for (const label of ['Target', /^Pours/, 'Compare', 'Sign-off']) await jump.getByRole('link', { name: label }).waitFor();
    expect(await noSideScroll(page)).toBe(true);
    await page.screenshot({ path: artifactPath('traps-match-390.png'), fullPage: true });

    // 2 and 10. The calculator reads "1/2", refuses "1/0" and drops the old result.
    await page.goto(`${baseUrl()}/calculator`);
    await page.getByLabel('Dose 1 amount').fill('1/2');
    const scaled = page.getByRole('table', { name: 'Scaled recipe' });
    await expect.poll(() => scaled.textContent()).toContain('1 drop'); // ½ drop per cup × 2 cups
    await page.getByLabel('Dose 1 amount').fill('1/0');
    await page.getByRole('alert').filter({ hasText: 'Dose 1: "1/0" divides by zero' }).waitFor();
    expect(await scaled.count()).toBe(0);
    await page.getByLabel('Target (L* a* b*, or hex)').fill('50 0 0');
    await page.getByLabel('Trial (L* a* b*, or hex)').fill('52 0 0');
    await page.getByRole('button', { name: 'Compare', exact: true }).click();
    const diff = page.getByLabel('Difference');
    await diff.waitFor();
    await page.getByLabel('Trial (L* a* b*, or hex)').fill('not a colour');
    await page.getByRole('button', { name: 'Compare', exact: true }).click();
    await page.getByRole('alert').filter({ hasText: 'Type each colour' }).waitFor();
    expect(await diff.count()).toBe(0);
    expect(await noSideScroll(page)).toBe(true);
    await page.screenshot({ path: artifactPath('traps-calculator-390.png'), fullPage: true });

    // 14. Icons and the manifest answer.
    for (const path of ['/manifest.webmanifest', '/favicon.ico', '/icon-192.png', '/icon-512.png']) {
      expect((await page.request.get(`${baseUrl()}${path}`)).status(), path).toBe(200);
    }
    await page.context().close();
    // The sign-off request reached the lead's queue.
    const queue = (await api('/api/sign-off-queue', { cookie: await signInAs('lead@demo.test', 'pourproof-demo', '10.75.0.9') })).body as any[];
    expect(queue.some((q) => q.matchId === matchId && q.number === 1)).toBe(true);
  });

  it('the lead finds the waiting pour from the navigation and approves it, at 1280 px and at 390 px', { timeout: 120_000 }, async () => {
    const desk = await open(browser(), 'lead@demo.test', DESK, '10.75.0.2');
    const maker = await signInAs('maker@demo.test', 'pourproof-demo', '10.75.0.3');
    // A pour of our own, submitted, so the queue holds at least one.
    const colorants = (await api('/api/colorants', { cookie: maker })).body as any[];
    const pigment = colorants.find((c) => c.unit === 'drops');
    const qName = `${name} queue`;
    const matchId = (await api('/api/matches', { cookie: maker, body: { name: qName, zones: ['back', 'belly'] } })).body.id;
    const { uploadPhoto, BACK_SHAPE, BELLY_SHAPE, twoTonePng } = await import('../support/photos');
    const zones = [{ name: 'back', shape: BACK_SHAPE }, { name: 'belly', shape: BELLY_SHAPE }];
    const ref = await uploadPhoto(maker, await twoTonePng(TARGET.back, TARGET.belly), 'reference');
    expect((await api(`/api/matches/${matchId}/target`, { cookie: maker, body: { photoId: ref.id, zones } })).status).toBe(200);
    const photo = await uploadPhoto(maker, await twoTonePng(POUR.back, POUR.belly), 'pour');
    const pour = await api(`/api/matches/${matchId}/pours`, { cookie: maker, body: { photoId: photo.id, recipe: [{ zone: 'back', colorantId: pigment.id, amount: 4, unit: 'drops' }], zones } });
    expect((await api(`/api/pours/${pour.body.id}/submit`, { cookie: maker, body: {} })).status).toBe(200);

    await desk.reload();
    const nav = desk.getByRole('navigation', { name: 'Main' });
    const matchesLink = nav.getByRole('link', { name: /^Matches\s*\d+ pours? waits? for your sign-off$/ });
    await matchesLink.waitFor();
    const count = Number((await matchesLink.textContent())!.match(/\d+/)![0]);
    expect(count).toBeGreaterThanOrEqual(1);
    const queue = desk.getByRole('list', { name: 'Pours waiting for sign-off' });
    await queue.waitFor();
    const entry = queue.getByRole('listitem').filter({ hasText: `${qName}, pour #1` });
    expect(await entry.textContent()).toMatch(/back \d+\.\d( ± \d+\.\d)? ΔE00/);
    expect(await entry.textContent()).toMatch(/belly \d+\.\d( ± \d+\.\d)? ΔE00/);
    await desk.screenshot({ path: artifactPath('traps-lead-queue-1280.png'), fullPage: true });

    const phone = await open(browser(), 'lead@demo.test', PHONE, '10.75.0.4');
    await phone.getByRole('navigation', { name: 'Main' }).getByRole('button', { name: /^Menu\s*\d+ pours? waits? for your sign-off$/ }).waitFor();
    await phone.getByRole('list', { name: 'Pours waiting for sign-off' }).getByRole('link', { name: `${qName}, pour #1` }).click();
    await phone.getByRole('heading', { name: qName, level: 1 }).waitFor();
    const signoff = phone.getByRole('region', { name: 'Sign-off of pour #1' });
    await signoff.getByRole('button', { name: 'Approve as standard' }).click();
    await signoff.getByText('this pour is the match’s standard').waitFor({ timeout: 15_000 });
    expect(await noSideScroll(phone)).toBe(true);
    await phone.screenshot({ path: artifactPath('traps-lead-approved-390.png'), fullPage: true });

    // 8. Log a batch from the Standards page opens the batch form on the match page.
    await phone.goto(`${baseUrl()}/standards`);
    await phone.getByRole('article', { name: qName }).getByRole('link', { name: `Log a batch of ${qName}` }).click();
    await phone.getByRole('form', { name: 'Log a batch' }).waitFor({ timeout: 15_000 });
    await expect.poll(() => focusedLabel(phone)).toMatch(/Batch size/);
    await phone.goto(`${baseUrl()}/batches`);
    await phone.getByRole('form', { name: 'Log a batch' }).getByLabel('Standard to log a batch of').selectOption({ label: qName });
    await phone.getByRole('form', { name: 'Log a batch' }).getByRole('button', { name: 'Log a batch' }).click();
    await phone.waitForURL(new RegExp(`/matches/${matchId}\\?log=batch`));
    await phone.getByRole('form', { name: 'Log a batch' }).waitFor({ timeout: 15_000 });
    await phone.screenshot({ path: artifactPath('traps-log-batch-390.png') });

    // 12. Matches at 390 px keep the ΔE00 column in view.
    await phone.goto(`${baseUrl()}/matches`);
    await phone.getByRole('table').first().waitFor();
    expect(await noSideScroll(phone)).toBe(true);
    await phone.screenshot({ path: artifactPath('traps-matches-390.png'), fullPage: true });
    // Every section at 390 px: reachable from the menu, no sideways scroll, one screenshot each.
    for (const section of ['Photos', 'Colorants', 'Molds', 'Standards', 'Batches', 'Team', 'Calculator']) {
      const nav = phone.getByRole('navigation', { name: 'Main' });
      await nav.getByRole('button', { name: /^Menu/ }).click();
      await nav.getByRole('link', { name: section, exact: true }).click();
      await phone.getByRole('heading', { name: section, level: 1 }).waitFor();
      expect(await nav.getByRole('link', { name: section, exact: true }).isVisible(), `${section}: the menu closes on arrival`).toBe(false);
      expect(await noSideScroll(phone), section).toBe(true);
      await phone.screenshot({ path: artifactPath(`traps-${section.toLowerCase()}-390.png`), fullPage: true });
    }
    await desk.context().close();
    await phone.context().close();
  });
});
