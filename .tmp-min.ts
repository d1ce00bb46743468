import sharp from 'sharp';
import { measurePhoto } from '@/lib/image';
import { runMeasureBench } from './bench/measure';
async function main() {
  // reuse the bench image generator through a tiny trick: time our own loops with min-of-N
  const W = 4000, H = 3000;
  const mod = await import('./bench/measure');
  void mod; void runMeasureBench;
  let seed = 12345; const rand = () => ((seed = (Math.imul(seed, 1103515245) + 12345) >>> 0) / 4294967296);
  const raw = Buffer.alloc(W * H * 3);
  for (let y = 0; y < H; y++) for (let x = 0; x < W; x++) { const shade = 0.85 + 0.3 * Math.sin((Math.PI * y) / H) * (0.8 + 0.2 * Math.cos((Math.PI * x) / W)); const n = (rand() + rand() + rand() - 1.5) * 6; const i = (y * W + x) * 3; raw[i] = 70 * shade + n; raw[i + 1] = 125 * shade + n; raw[i + 2] = 80 * shade + n; }
  for (let k = 0; k < 26666; k++) { const size = 4 + Math.floor(rand() * 5); const x0 = Math.floor(rand() * (W - size)); const y0 = Math.floor(rand() * (H - size)); const c = rand() < 0.5 ? [215, 170, 45] : [22, 20, 24]; for (let y = y0; y < y0 + size; y++) for (let x = x0; x < x0 + size; x++) raw.set(c, (y * W + x) * 3); }
  for (let y = 0; y < H; y++) for (let x = Math.max(0, Math.round(0.8 * y + 600)), e = Math.min(W, x + 40); x < e; x++) raw.set([255, 255, 252], (y * W + x) * 3);
  const jpg = await sharp(raw, { raw: { width: W, height: H, channels: 3 } }).jpeg({ quality: 90 }).toBuffer();
  const shape = { type: 'rect' as const, x: 0.25, y: 0.25, w: 0.5, h: 0.5 };
  const box = { left: 1000, top: 750, width: 2000, height: 1500 };
  const res: Record<string, number[]> = {};
  const tasks: [string, () => Promise<unknown>][] = [
    ['sharp', () => sharp(jpg).extract(box).raw().toBuffer()],
    ['1M', () => measurePhoto(jpg, [{ name: 'b', shape }], undefined, { maxSamples: 1e6 })],
    ['500k', () => measurePhoto(jpg, [{ name: 'b', shape }], undefined, { maxSamples: 5e5 })],
    ['250k', () => measurePhoto(jpg, [{ name: 'b', shape }], undefined, { maxSamples: 2.5e5 })],
    ['all', () => measurePhoto(jpg, [{ name: 'b', shape }], undefined, { maxSamples: Infinity })],
  ];
  for (let r = 0; r < 15; r++) for (const [k, f] of tasks) { const t = performance.now(); await f(); (res[k] ??= []).push(performance.now() - t); }
  for (const [k, v] of Object.entries(res)) { v.sort((a, b) => a - b); console.log(k.padEnd(6), 'min', v[0].toFixed(1), 'p25', v[3].toFixed(1), 'median', v[7].toFixed(1)); }
}
main();
