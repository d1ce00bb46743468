import { describe, expect, it } from 'vitest';
import { sanitiseFileName } from './sanitiseFileName';

describe('sanitiseFileName', () => {
  it('keeps only the last path part and never a leading dot', () => {
    expect(sanitiseFileName('../../etc/passwd.png', 'png')).toBe('passwd.png');
    expect(sanitiseFileName('C:\\Users\\shop\\back.JPG', 'jpeg')).toBe('back.JPG');
    expect(sanitiseFileName('..', 'png')).toBe('photo.png');
    expect(sanitiseFileName('.hidden.webp', 'webp')).toBe('hidden.webp');
    expect(sanitiseFileName('dir/', 'png')).toBe('photo.png');
  });

  it('gives the name the extension of the format the bytes really are', () => {
    expect(sanitiseFileName('belly.jpeg', 'jpeg')).toBe('belly.jpeg');
    expect(sanitiseFileName('belly.jpg', 'png')).toBe('belly.png');
    expect(sanitiseFileName('notes.txt', 'webp')).toBe('notes.webp');
    expect(sanitiseFileName('no-extension', 'png')).toBe('no-extension.png');
    expect(sanitiseFileName(null, 'jpeg')).toBe('photo.jpg');
  });

  it('replaces control and quoting characters and caps the length', () => {
    expect(sanitiseFileName('a"b\u0000c\nd<e>.png', 'png')).toBe('a_b_c_d_e_.png');
    const long = sanitiseFileName(`${'x'.repeat(500)}.png`, 'png');
    expect(long).toHaveLength(120);
    expect(long.endsWith('.png')).toBe(true);
  });

  it('drops invisible format characters, so a right-to-left override cannot disguise the extension (Unicode category Cf)', () => {
    expect(sanitiseFileName('bait\u202egnp.exe.png', 'png')).toBe('baitgnp.exe.png');
    expect(sanitiseFileName('a\u200bb\u2066c.jpg', 'jpeg')).toBe('abc.jpg');
  });
});
