// Bench: the full measuring pipeline against sharp alone on the same region.
// Run: npx tsx bench/measure.ts   (or call runMeasureBench() from a bench runner)
import { pathToFileURL } from 'node:url';
import sharp from 'sharp';
import type { RectShape } from '@/lib/color';
import { measurePhoto } from '@/lib/image';

export interface MeasureBenchResult {
  width: number;
  height: number;
  regionPixels: number;
  runs: number;
  /** Median ms of measurePhoto on the region (decode + white balance + measure). */
  pipelineMs: number;
  /** Median ms of sharp decoding the same JPEG and extracting the region to raw pixels. */
  sharpMs: number;
  ratio: number;
  /** The very first measurePhoto call of the process, before the JIT has compiled anything. */
  coldMs: number;
  /** Ratio of the fastest runs: less sensitive to other load on the machine. */
  minRatio: number;
  /** Median ms of measurePhoto measuring every pixel (maxSamples: Infinity), for comparison. */
  exactMs: number;
  exactRatio: number;
}

const W = 4000;
const WARM_UP = 6;
const H = 3000;

// A photo-like 12-megapixel JPEG: a shaded green body, camera-like noise, gold and black flake
// specks (~8 %), a glare streak. Seeded, so every run measures the same image.
export async function benchPhoto(): Promise<Buffer> {
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

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
};

/** The region every measure line measures: a quarter of the photo, in its middle. */
export const BENCH_SHAPE: RectShape = { type: 'rect', x: 0.25, y: 0.25, w: 0.5, h: 0.5 };
export const BENCH_BOX = { left: W / 4, top: H / 4, width: W / 2, height: H / 2 };

export async function runMeasureBench(runs = 9): Promise<MeasureBenchResult> {
  const jpg = await benchPhoto();
  const shape = BENCH_SHAPE;
  const box = BENCH_BOX;
  const pipeline = () => measurePhoto(jpg, [{ name: 'back', shape }]);
  const exact = () => measurePhoto(jpg, [{ name: 'back', shape }], undefined, { maxSamples: Infinity });
  const sharpOnly = () => sharp(jpg).extract(box).raw().toBuffer();

  const t0 = performance.now();
  await pipeline();
  const coldMs = performance.now() - t0;

  // Interleaved in pairs so load on the machine hits both alike, after WARM_UP runs each: the
  // server measures many photos per process, so the JIT has compiled the hot loops long before.
  const timed = async (tasks: (() => Promise<unknown>)[]) => {
    for (let r = 0; r < WARM_UP; r++) for (const task of tasks) await task();
    const times = tasks.map(() => [] as number[]);
    for (let r = 0; r < runs; r++) {
      for (const [k, task] of tasks.entries()) {
        const t = performance.now();
        await task();
        times[k].push(performance.now() - t);
      }
    }
    return times;
  };
  const [a, b] = await timed([pipeline, sharpOnly]);
  const [c, d] = await timed([exact, sharpOnly]);
  const [pipelineMs, sharpMs, exactMs, sharpMs2] = [a, b, c, d].map(median);
  if (process.env.BENCH_DEBUG) console.log([a, b, c, d].map((x) => x.map((v) => v.toFixed(0)).join(' ')));
  return {
    width: W,
    height: H,
    regionPixels: box.width * box.height,
    runs,
    pipelineMs,
    sharpMs,
    ratio: pipelineMs / sharpMs,
    coldMs,
    minRatio: Math.min(...a) / Math.min(...b),
    exactMs,
    exactRatio: exactMs / sharpMs2,
  };
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  runMeasureBench().then((r) => {
    console.log(`measure bench: ${r.width}×${r.height} JPEG q90, region ${r.regionPixels.toLocaleString('en')} px, median of ${r.runs}`);
    console.log(`  full pipeline (measurePhoto):           ${r.pipelineMs.toFixed(1)} ms`);
    console.log(`  sharp decode + extract to raw:          ${r.sharpMs.toFixed(1)} ms`);
    console.log(`  ratio: ${r.ratio.toFixed(2)} (goal ≤ 1.25); fastest runs: ${r.minRatio.toFixed(2)}`);
    console.log(`  first call in a fresh process:         ${r.coldMs.toFixed(1)} ms (JIT not yet warm)`);
    console.log(`  every pixel (maxSamples: Infinity):     ${r.exactMs.toFixed(1)} ms, ratio ${r.exactRatio.toFixed(2)}`);
  });
}
