import 'server-only';
/**
 * How coarsely a JPEG was quantised: the mean of its first (luminance) quantisation table divided
 * by the mean of the example luminance table of ITU-T T.81 Annex K.1 (Table K.1, mean 57.6),
 * which libjpeg uses at quality 50. About 0.2 at quality 90, 0.5 at quality 75. Reads the DQT
 * segments (T.81 §B.2.4.1) before the first SOS; null for anything else.
 */
export function jpegQuantScale(buf: Buffer): number | null {
  if (buf.length < 4 || buf[0] !== 0xff || buf[1] !== 0xd8) return null;
  let o = 2;
  while (o + 4 <= buf.length) {
    if (buf[o] !== 0xff) return null;
    const marker = buf[o + 1];
    if (marker === 0xda || marker === 0xd9) return null;
    const len = buf.readUInt16BE(o + 2);
    if (marker === 0xdb) {
      const pq = buf[o + 4] >> 4;
      let sum = 0;
      for (let k = 0; k < 64; k++) sum += pq ? buf.readUInt16BE(o + 5 + 2 * k) : buf[o + 5 + k];
      return sum / 64 / 57.625;
    }
    o += 2 + len;
  }
  return null;
}
