import sharp from 'sharp';

export type HealthUnderMeasure = { measurements: number; statuses: number[]; measureMs: number; healthCount: number; healthP50: number; healthP95: number; healthMax: number };

async function signIn(base: string, email: string): Promise<string> {
  const res = await fetch(`${base}/api/auth/sign-in`, { method: 'POST', headers: { 'content-type': 'application/json', origin: base }, body: JSON.stringify({ email, password: 'pourproof-demo' }) });
  return res.headers.get('set-cookie')!.split(';')[0]!;
}

// A 20-megapixel JPEG: a smooth gradient with a little grain.
async function heavyPhoto(): Promise<Buffer> {
  const w = 5000;
  const h = 4000;
  const px = Buffer.alloc(w * h * 3);
  let seed = 7;
  for (let y = 0; y < h; y++)
    for (let x = 0; x < w; x++) {
      seed = (seed * 1103515245 + 12345) >>> 0;
      const i = (y * w + x) * 3;
      px[i] = 60 + ((x * 120) / w) + (seed >>> 29);
      px[i + 1] = 90 + ((y * 100) / h) + ((seed >>> 26) & 7);
      px[i + 2] = 70 + (seed >>> 30);
    }
  return sharp(px, { raw: { width: w, height: h, channels: 3 } }).jpeg({ quality: 90 }).toBuffer();
}

// 16 full-height outlines of 60 points: heavy, and within the work budget.
function regions() {
  return Array.from({ length: 16 }, (_, k) => ({
    name: `zone ${k + 1}`,
    shape: { type: 'polygon', points: Array.from({ length: 60 }, (_, i) => [Math.round((0.02 + k * 0.06 + (i % 2 ? 0.04 : 0)) * 1000) / 1000, Math.round((i / 59) * 1000) / 1000]) },
  }));
}

/**
 * Six heavy measurements at once (three members, two each: the per-member
 * limit) while /api/health is asked every 25 ms: how long health takes to
 * answer while the photos are being measured.
 */
export async function healthUnderMeasure(base: string): Promise<HealthUnderMeasure> {
  const photo = await heavyPhoto();
  const cookies = await Promise.all(['maker@demo.test', 'lead@demo.test', 'owner@demo.test'].map((e) => signIn(base, e)));
  const body = () => {
    const form = new FormData();
    form.set('image', new Blob([new Uint8Array(photo)], { type: 'image/jpeg' }), 'heavy.jpg');
    form.set('regions', JSON.stringify(regions()));
    return form;
  };
  let done = false;
  const latencies: number[] = [];
  const poll = (async () => {
    while (!done) {
      const t0 = performance.now();
      await fetch(`${base}/api/health`).then((r) => r.arrayBuffer());
      latencies.push(performance.now() - t0);
      await new Promise((r) => setTimeout(r, 25));
    }
  })();
  const t0 = performance.now();
  const statuses = await Promise.all(
    Array.from({ length: 6 }, (_, i) => fetch(`${base}/api/measure`, { method: 'POST', body: body(), headers: { origin: base, cookie: cookies[i % 3]! } }).then(async (r) => (await r.arrayBuffer(), r.status))),
  );
  const measureMs = performance.now() - t0;
  done = true;
  await poll;
  const sorted = [...latencies].sort((a, b) => a - b);
  const q = (p: number) => sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))] ?? 0;
  return { measurements: 6, statuses, measureMs, healthCount: sorted.length, healthP50: q(0.5), healthP95: q(0.95), healthMax: sorted[sorted.length - 1] ?? 0 };
}
