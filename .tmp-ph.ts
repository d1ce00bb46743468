import sharp from 'sharp';
import { measureRegion, regionColors, shapeSpans, spanBounds, SRGB_TO_XYZ } from '@/lib/color';
import { decodeImage, inspectImage } from '@/lib/image';
async function main() {
  const W = 4000, H = 3000;
  let seed = 12345; const rand = () => ((seed = (Math.imul(seed, 1103515245) + 12345) >>> 0) / 4294967296);
  const raw = Buffer.alloc(W * H * 3);
  for (let y = 0; y < H; y++) for (let x = 0; x < W; x++) { const shade = 0.85 + 0.3 * Math.sin((Math.PI * y) / H) * (0.8 + 0.2 * Math.cos((Math.PI * x) / W)); const n = (rand() + rand() + rand() - 1.5) * 6; const i = (y * W + x) * 3; raw[i] = 70 * shade + n; raw[i + 1] = 125 * shade + n; raw[i + 2] = 80 * shade + n; }
  for (let k = 0; k < 26666; k++) { const size = 4 + Math.floor(rand() * 5); const x0 = Math.floor(rand() * (W - size)); const y0 = Math.floor(rand() * (H - size)); const c = rand() < 0.5 ? [215, 170, 45] : [22, 20, 24]; for (let y = y0; y < y0 + size; y++) for (let x = x0; x < x0 + size; x++) raw.set(c, (y * W + x) * 3); }
  const jpg = await sharp(raw, { raw: { width: W, height: H, channels: 3 } }).jpeg({ quality: 90 }).toBuffer();
  const v: Record<string, number[]> = {};
  const lap = (k: string, t: number) => (v[k] ??= []).push(performance.now() - t);
  for (let r = 0; r < 15; r++) {
    for (const step of [1, 2, 3, 4]) {
      let t = performance.now();
      const header = await inspectImage(jpg); lap('inspect', t); t = performance.now();
      const spans = shapeSpans({ type: 'rect', x: 0.25, y: 0.25, w: 0.5, h: 0.5 }, W, H);
      const crop = spanBounds(spans)!; lap('spans', t); t = performance.now();
      const { window } = await decodeImage(jpg, { header, crop }); lap('decode', t); t = performance.now();
      const s = regionColors(window, spans, SRGB_TO_XYZ, step); lap(`colours s${step} (${s.size})`, t); t = performance.now();
      measureRegion(s); lap(`measure s${step}`, t);
    }
  }
  for (const [k, x] of Object.entries(v)) { x.sort((a, b) => a - b); console.log(k.padEnd(22), 'min', x[0].toFixed(1), 'median', x[Math.floor(x.length / 2)].toFixed(1)); }
}
main();
