import sharp from 'sharp';
import { findGlare, measureRegion, regionColors, shapeSpans } from '@/lib/color';
import { decodeImage, inspectImage } from '@/lib/image';
async function benchPhoto(W: number, H: number): Promise<Buffer> {
  let seed = 12345;
  const rand = () => ((seed = (Math.imul(seed, 1103515245) + 12345) >>> 0) / 4294967296);
  const raw = Buffer.alloc(W * H * 3);
  for (let y = 0; y < H; y++) {
    for (let x = 0; x < W; x++) {
      const shade = 0.85 + 0.3 * Math.sin((Math.PI * y) / H) * (0.8 + 0.2 * Math.cos((Math.PI * x) / W));
      const n = (rand() + rand() + rand() - 1.5) * 6; // ≈ normal, σ ≈ 3 code values
      const i = (y * W + x) * 3;
      raw[i] = Math.max(0, Math.min(255, 70 * shade + n));
      raw[i + 1] = Math.max(0, Math.min(255, 125 * shade + n));
      raw[i + 2] = Math.max(0, Math.min(255, 80 * shade + n));
    }
  }
  const specks = Math.round((0.08 * W * H) / 36);
  for (let k = 0; k < specks; k++) {
    const size = 4 + Math.floor(rand() * 5);
    const x0 = Math.floor(rand() * (W - size));
    const y0 = Math.floor(rand() * (H - size));
    const c = rand() < 0.5 ? [215, 170, 45] : [22, 20, 24];
    for (let y = y0; y < y0 + size; y++) for (let x = x0; x < x0 + size; x++) raw.set(c, (y * W + x) * 3);
  }
  for (let y = 0; y < H; y++) for (let x = Math.max(0, Math.round(0.8 * y + 600)), e = Math.min(W, x + 40); x < e; x++) raw.set([255, 255, 252], (y * W + x) * 3);
  return sharp(raw, { raw: { width: W, height: H, channels: 3 } }).jpeg({ quality: 90 }).toBuffer();
}


async function main() {
  const W = 4000, H = 3000;
  let seed = 12345; const rand = () => ((seed = (Math.imul(seed, 1103515245) + 12345) >>> 0) / 4294967296);
  const raw = Buffer.alloc(W * H * 3);
  for (let y = 0; y < H; y++) for (let x = 0; x < W; x++) { const shade = 0.85 + 0.3 * Math.sin((Math.PI * y) / H) * (0.8 + 0.2 * Math.cos((Math.PI * x) / W)); const n = (rand() + rand() + rand() - 1.5) * 6; const i = (y * W + x) * 3; raw[i] = 70 * shade + n; raw[i + 1] = 125 * shade + n; raw[i + 2] = 80 * shade + n; }
  const jpg = await benchPhoto(W, H);
  for (let rep = 0; rep < 4; rep++) {
    let t = performance.now(); const header = await inspectImage(jpg); const t1 = performance.now() - t;
    const spans = shapeSpans({ type: 'rect', x: 0.25, y: 0.25, w: 0.5, h: 0.5 }, W, H);
    t = performance.now(); const { window } = await decodeImage(jpg, { header, crop: { left: 1000, top: 750, width: 2000, height: 1500 } }); const t2 = performance.now() - t;
    t = performance.now(); const s = regionColors(window, spans, undefined, Number(process.env.STEP ?? 1)); const t3 = performance.now() - t;
    t = performance.now(); findGlare(s); const t4 = performance.now() - t;
    t = performance.now(); const m = measureRegion(s); const t5 = performance.now() - t;
    const { measurePhoto } = await import('@/lib/image');
    t = performance.now(); await measurePhoto(jpg, [{ name: 'b', shape: { type: 'rect', x: 0.25, y: 0.25, w: 0.5, h: 0.5 } }]); const t6 = performance.now() - t;
    t = performance.now(); await sharp(jpg).extract({ left: 1000, top: 750, width: 2000, height: 1500 }).raw().toBuffer(); const t7 = performance.now() - t;
    console.log({ photo: t6.toFixed(1), sharp: t7.toFixed(1) });
    console.log({ inspect: t1.toFixed(1), decode: t2.toFixed(1), colours: t3.toFixed(1), glare: t4.toFixed(1), measure: t5.toFixed(1), distinct: s.size, kept: m.kept });
  }
}
main();
