import 'server-only';
import { PHOTO_FORMATS, type PhotoFormat } from './limits';

const MAX_NAME = 120;

/**
 * A client's file name is kept only as a display name: path parts are dropped
 * (`../../etc/passwd.png` → `passwd.png`, `C:\\a\\b.jpg` → `b.jpg`), control and
 * quote characters replaced, invisible format characters (bidi overrides)
 * dropped, length capped, and the extension made to match the
 * format the bytes really are.
 */
export function sanitiseFileName(name: string | null | undefined, format: PhotoFormat): string {
  const last = String(name ?? '').split(/[/\\]/).pop() ?? '';
  let base = last
    .normalize('NFC')
    .replace(/[\u0000-\u001f\u007f"<>|:*?]/g, '_')
    // Invisible format characters, the bidirectional overrides among them
    // (U+202E shows "gnp.exe" as "exe.png"): Unicode general category Cf.
    .replace(/\p{Cf}/gu, '')
    .replace(/^[.\s]+/, '')
    .trim();
  const ext = PHOTO_FORMATS[format].ext;
  const allowed = format === 'jpeg' ? ['jpg', 'jpeg'] : [ext];
  const dot = base.lastIndexOf('.');
  const given = dot > 0 ? base.slice(dot + 1).toLowerCase() : '';
  if (!allowed.includes(given)) base = `${dot > 0 ? base.slice(0, dot) : base || 'photo'}.${ext}`;
  if (base.length > MAX_NAME) {
    const suffix = base.slice(base.lastIndexOf('.'));
    base = base.slice(0, MAX_NAME - suffix.length) + suffix;
  }
  return base.startsWith('.') ? `photo${base}` : base;
}
