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
