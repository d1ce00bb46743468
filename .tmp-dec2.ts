import sharp from 'sharp';
async function main() {
  const W = 4000, H = 3000;
  let seed = 12345; const rand = () => ((seed = (Math.imul(seed, 1103515245) + 12345) >>> 0) / 4294967296);
  const raw = Buffer.alloc(W * H * 3);
  for (let i = 0; i < raw.length; i += 3) { const n = (rand() - 0.5) * 12; raw[i] = 70 + n; raw[i + 1] = 125 + n; raw[i + 2] = 80 + n; }
  const jpg = await sharp(raw, { raw: { width: W, height: H, channels: 3 } }).jpeg({ quality: 90 }).toBuffer();
  const box = { left: 1000, top: 750, width: 2000, height: 1500 };
  const v: Record<string, number[]> = {};
  const tasks: [string, () => Promise<unknown>][] = [
    ['baseline', () => sharp(jpg).extract(box).raw().toBuffer()],
    ['autoOrient', () => sharp(jpg, { autoOrient: true }).extract(box).raw().toBuffer()],
    ['limit', () => sharp(jpg, { limitInputPixels: 40e6 }).extract(box).raw().toBuffer()],
    ['srgb', () => sharp(jpg).extract(box).toColourspace('srgb').raw().toBuffer()],
    ['removeAlpha', () => sharp(jpg).extract(box).removeAlpha().raw().toBuffer()],
    ['depth', () => sharp(jpg).extract(box).raw({ depth: 'uchar' }).toBuffer()],
    ['resolveObj', () => sharp(jpg).extract(box).raw().toBuffer({ resolveWithObject: true })],
    ['meta', () => sharp(jpg).metadata()],
  ];
  for (let r = 0; r < 15; r++) for (const [k, f] of tasks) { const t = performance.now(); await f(); (v[k] ??= []).push(performance.now() - t); }
  for (const [k, x] of Object.entries(v)) { x.sort((a, b) => a - b); console.log(k.padEnd(12), 'min', x[0].toFixed(1), 'p25', x[3].toFixed(1), 'median', x[7].toFixed(1)); }
}
main();
