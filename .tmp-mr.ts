import sharp from 'sharp';
import { clusterFlake, findGlare, measureRegion, regionColors, shapeSpans, weightedMedian } from '@/lib/color';
import { decodeImage } from '@/lib/image';
const show = () => console.log(Object.fromEntries(Object.entries((globalThis as any).__tm).map(([k, v]) => [k, ((v as number) / 15).toFixed(2)])));
async function main() {
  const W = 4000, H = 3000;
  let seed = 12345; const rand = () => ((seed = (Math.imul(seed, 1103515245) + 12345) >>> 0) / 4294967296);
  const raw = Buffer.alloc(W * H * 3);
  for (let y = 0; y < H; y++) for (let x = 0; x < W; x++) { const shade = 0.85 + 0.3 * Math.sin((Math.PI * y) / H) * (0.8 + 0.2 * Math.cos((Math.PI * x) / W)); const n = (rand() + rand() + rand() - 1.5) * 6; const i = (y * W + x) * 3; raw[i] = 70 * shade + n; raw[i + 1] = 125 * shade + n; raw[i + 2] = 80 * shade + n; }
  for (let k = 0; k < 26666; k++) { const size = 4 + Math.floor(rand() * 5); const x0 = Math.floor(rand() * (W - size)); const y0 = Math.floor(rand() * (H - size)); const c = rand() < 0.5 ? [215, 170, 45] : [22, 20, 24]; for (let y = y0; y < y0 + size; y++) for (let x = x0; x < x0 + size; x++) raw.set(c, (y * W + x) * 3); }
  const jpg = await sharp(raw, { raw: { width: W, height: H, channels: 3 } }).jpeg({ quality: 90 }).toBuffer();
  const { window } = await decodeImage(jpg, { crop: { left: 1000, top: 750, width: 2000, height: 1500 } });
  const spans = shapeSpans({ type: 'rect', x: 0.25, y: 0.25, w: 0.5, h: 0.5 }, W, H);
  const times: Record<string, number[]> = {};
  const time = (k: string, f: () => unknown) => { const t = performance.now(); const r = f(); (times[k] ??= []).push(performance.now() - t); return r; };
  for (let r = 0; r < 15; r++) {
    const s = time('colours', () => regionColors(window, spans, undefined, 2)) as ReturnType<typeof regionColors>;
    time('glare', () => findGlare(s));
    time('median', () => weightedMedian(s.lab, s.counts, -1, 110, 0.05, undefined, 3, 0));
    const fl = new Uint8Array(s.size); for (let i = 0; i < s.size; i += 7) fl[i] = 1;
    time('cluster', () => clusterFlake(s, fl));
    time('measure', () => measureRegion(s));
  }
  show();
  for (const [k, v] of Object.entries(times)) console.log(k.padEnd(8), 'min', Math.min(...v).toFixed(1), 'median', v.sort((a, b) => a - b)[7].toFixed(1));
}
main();
