import { randomBytes } from 'node:crypto';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { artifactPath, browserAvailable, useBrowser } from '../support/browser';
import { api, baseUrl, signInAs } from '../support/http';

// The Photos page in Chromium: the demo maker drops a PNG on the dropzone (through
// @uploadthing/react to the uploads stand-in), sees it on the stage with its size,
// and it lands in the team's list.
describe.runIf(browserAvailable())('browser: upload a photo on the Photos page', () => {
  const browser = useBrowser();

  async function contextAs(email: string, ip: string) {
    const cookie = await signInAs(email, 'pourproof-demo', ip);
    const [name, value] = cookie.split('=') as [string, string];
    const context = await browser().newContext({ viewport: { width: 390, height: 844 } });
    await context.addCookies([{ name, value, url: baseUrl() }]);
    return { context, cookie };
  }

  it('the demo maker uploads a PNG and sees it with its pixel and file size', async () => {
    const { context, cookie } = await contextAs('maker@demo.test', '10.62.0.1');
    const page = await context.newPage();
    await page.goto(`${baseUrl()}/photos`);
    await page.getByRole('heading', { name: 'Photos', level: 1 }).waitFor();
    await page.getByRole('button', { name: 'Test pour', exact: true }).click();
    expect(await page.getByRole('button', { name: 'Test pour', exact: true }).getAttribute('aria-pressed')).toBe('true');
    await page.screenshot({ path: artifactPath('photos-dropzone-390.png') });

    const png = await sharp(randomBytes(120 * 90 * 3), { raw: { width: 120, height: 90, channels: 3 } }).png().toBuffer();
    await page.getByTestId('photo-input').setInputFiles({ name: 'pour-3-side.png', mimeType: 'image/png', buffer: png });

    const caption = page.getByRole('status').filter({ hasText: 'Uploaded' });
    await caption.waitFor({ timeout: 20_000 });
    expect(await caption.textContent()).toMatch(/pour-3-side\.png: 120 × 90 px · \d+\.\d KB/);
    const shown = page.getByRole('img', { name: 'Uploaded photo pour-3-side.png' });
    await expect.poll(() => shown.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(120);
    expect(await shown.getAttribute('src')).toMatch(/^\/api\/photos\/[^/]+\/image$/);

    const list = page.getByRole('list', { name: 'Recent photos' });
    await expect.poll(() => list.textContent()).toContain('pour-3-side.png');
    await page.screenshot({ path: artifactPath('photos-upload-390.png'), fullPage: true });

    // The same bytes come back from the app to the team.
    const photos = (await api('/api/photos', { cookie })).body as { id: string; fileName: string; kind: string }[];
    const mine = photos.find((p) => p.fileName === 'pour-3-side.png')!;
    expect(mine.kind).toBe('pour');
    const served = await fetch(`${baseUrl()}/api/photos/${mine.id}/image`, { headers: { cookie } });
    expect(Buffer.from(await served.arrayBuffer()).equals(png)).toBe(true);
    await context.close();
  });

  it('says clearly why a text file named .png is refused, and keeps nothing', async () => {
    const { context, cookie } = await contextAs('maker@demo.test', '10.62.0.2');
    const page = await context.newPage();
    await page.goto(`${baseUrl()}/photos`);
    const name = `notes-${randomBytes(6).toString('hex')}.png`;
    await page.getByTestId('photo-input').setInputFiles({ name, mimeType: 'image/png', buffer: Buffer.from('not a picture at all\n'.repeat(10)) });
    // Next's route announcer is an empty role=alert too; ours is the one with words.
    const alert = page.getByRole('alert').filter({ hasText: /\S/ });
    await alert.waitFor({ timeout: 20_000 });
    expect(await alert.textContent()).toMatch(/not a JPEG, PNG or WebP/);
    const names = ((await api('/api/photos', { cookie })).body as { fileName: string }[]).map((p) => p.fileName);
    expect(names).not.toContain(name);
    await context.close();
  });

  it('shows viewers the photos without a dropzone', async () => {
    const { context } = await contextAs('viewer@demo.test', '10.62.0.3');
    const page = await context.newPage();
    await page.goto(`${baseUrl()}/photos`);
    await page.getByRole('heading', { name: 'Recent photos' }).waitFor();
    expect(await page.getByTestId('photo-input').count()).toBe(0);
    expect(await page.getByText('makers, leads and owners upload them').count()).toBe(1);
    await context.close();
  });
});
