import { createHash } from 'node:crypto';

// A 1×1 RGBA PNG (70 bytes); decodes as png 1×1 with sharp (checked by hand).
export const TINY_PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==',
  'base64',
);

export const md5 = (bytes: Buffer) => createHash('md5').update(bytes).digest('hex');
