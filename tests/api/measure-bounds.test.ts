import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { baseUrl, expectErrorShape, signInAs } from '../support/http';

// Measuring is bounded: outlines that ask for too much rasterising work are
// refused before decoding (413), and one member may run only a few
// measurements at once (429 with Retry-After), so no one stalls the server.

async function measure(cookie: string, image: Buffer, regions: unknown) {
  const form = new FormData();
  form.append('image', new Blob([new Uint8Array(image)], { type: 'image/png' }), 'photo.png');
  form.append('regions', JSON.stringify(regions));
  const res = await fetch(`${baseUrl()}/api/measure`, { method: 'POST', body: form, headers: { origin: baseUrl(), cookie } });
  return { status: res.status, headers: res.headers, body: (await res.json()) as any };
}

// A zig-zag outline of n points from top to bottom of the photo.
function zigzag(n: number, x0: number): { type: 'polygon'; points: [number, number][] } {
  const points: [number, number][] = [];
  const r3 = (v: number) => Math.round(v * 1000) / 1000;
  for (let i = 0; i < n; i++) points.push([r3(x0 + (i % 2 ? 0.05 : 0)), r3(i / (n - 1))]);
  return { type: 'polygon', points };
}

describe('bounded photo work', () => {
  it('refuses 16 full-height 200-point zig-zags on a 6300 × 6300 photo with 413 before decoding', async () => {
    const cookie = await signInAs('maker@demo.test', 'pourproof-demo', '10.66.0.1');
    const png = await sharp({ create: { width: 6300, height: 6300, channels: 3, background: { r: 120, g: 140, b: 90 } } }).png({ compressionLevel: 9 }).toBuffer();
    const regions = Array.from({ length: 16 }, (_, i) => ({ name: `z${i}`, shape: zigzag(200, 0.02 + i * 0.06) }));
    const res = await measure(cookie, png, regions);
    expect(res.status).toBe(413);
    expectErrorShape(res.body);
    expect(res.body.error.code).toBe('too_much_work');
    expect(res.body.error.message).toMatch(/fewer or simpler outlines/);
    // Control: one such outline is within the budget and measured.
    const one = await measure(cookie, png, regions.slice(0, 1));
    expect(one.status).toBe(200);
    expect(one.body.regions[0].pixels).toBeGreaterThan(0);
  });

  it('lets one member run two measurements at once and answers the rest 429 with Retry-After', async () => {
    const cookie = await signInAs('lead@demo.test', 'pourproof-demo', '10.66.0.2');
    const w = 2400;
    const h = 2400;
    const px = Buffer.alloc(w * h * 3);
    for (let i = 0; i < px.length; i++) px[i] = (i * 2654435761) >>> 24; // noise: a slow photo to decode
    const png = await sharp(px, { raw: { width: w, height: h, channels: 3 } }).png({ compressionLevel: 1 }).toBuffer();
    const regions = [{ name: 'back', shape: { type: 'rect', x: 0, y: 0, w: 1, h: 1 } }];
    const answers = await Promise.all(Array.from({ length: 6 }, () => measure(cookie, png, regions)));
    const statuses = answers.map((a) => a.status).sort();
    expect(statuses.every((s) => s === 200 || s === 429), statuses.join(',')).toBe(true);
    expect(statuses.filter((s) => s === 200).length).toBeGreaterThanOrEqual(2);
    const refused = answers.filter((a) => a.status === 429);
    expect(refused.length).toBeGreaterThanOrEqual(1);
    for (const r of refused) {
      expectErrorShape(r.body);
      expect(Number(r.headers.get('retry-after'))).toBeGreaterThan(0);
    }
  });
});
