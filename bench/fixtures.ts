import { crc32 } from 'node:zlib';
import sharp from 'sharp';

// A 1×1 PNG whose header claims 30 000 × 30 000 pixels (CRC fixed up).
export async function hugeHeaderPng(): Promise<Buffer> {
  const png = Buffer.from(await sharp({ create: { width: 1, height: 1, channels: 3, background: '#777777' } }).png().toBuffer());
  png.writeUInt32BE(30000, 16);
  png.writeUInt32BE(30000, 20);
  png.writeUInt32BE(crc32(png.subarray(12, 29)) >>> 0, 29);
  return png;
}

// Waits for `next start` to answer, then signs in as the demo maker: the session cookie.
export async function signInWhenUp(base: string, tries = 240): Promise<string> {
  for (let i = 0; i < tries; i++) {
    if (await fetch(`${base}/api/health`).then((r) => r.ok).catch(() => false)) break;
    await new Promise((r) => setTimeout(r, 250));
  }
  const signIn = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email: 'maker@demo.test', password: 'pourproof-demo' }),
  });
  return signIn.headers.get('set-cookie')!.split(';')[0]!;
}
