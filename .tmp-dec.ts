import sharp from 'sharp';
import { decodeImage, inspectImage } from '@/lib/image';
async function main() {
  const W = 4000, H = 3000;
  let seed = 12345; const rand = () => ((seed = (Math.imul(seed, 1103515245) + 12345) >>> 0) / 4294967296);
  const raw = Buffer.alloc(W * H * 3);
  for (let i = 0; i < raw.length; i += 3) { const n = (rand() - 0.5) * 12; raw[i] = 70 + n; raw[i + 1] = 125 + n; raw[i + 2] = 80 + n; }
  const jpg = await sharp(raw, { raw: { width: W, height: H, channels: 3 } }).jpeg({ quality: 90 }).toBuffer();
  const box = { left: 1000, top: 750, width: 2000, height: 1500 };
  const v: Record<string, number[]> = {};
  const run = async (k: string, f: () => Promise<unknown>) => { const t = performance.now(); await f(); (v[k] ??= []).push(performance.now() - t); };
  for (let r = 0; r < 12; r++) {
    await run('baseline', () => sharp(jpg).extract(box).raw().toBuffer());
    await run('inspect', () => inspectImage(jpg));
    await run('decodeImage', () => decodeImage(jpg, { crop: box }));
    await run('autoOrient only', () => sharp(jpg, { autoOrient: true }).extract(box).raw().toBuffer());
    await run('+srgb', () => sharp(jpg, { autoOrient: true }).extract(box).toColourspace('srgb').raw().toBuffer());
    await run('+removeAlpha+depth', () => sharp(jpg, { autoOrient: true, limitInputPixels: 40e6 }).extract(box).toColourspace('srgb').removeAlpha().raw({ depth: 'uchar' }).toBuffer());
  }
  for (const [k, x] of Object.entries(v)) { x.sort((a, b) => a - b); console.log(k.padEnd(20), 'median', x[6].toFixed(1), 'min', x[0].toFixed(1)); }
}
main();
