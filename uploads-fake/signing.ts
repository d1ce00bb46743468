import { createHmac, timingSafeEqual } from 'node:crypto';

// The SDK's scheme (@uploadthing/shared 7.x, src/crypto.ts `signPayload`):
// "hmac-sha256=" + hex(HMAC-SHA256(key = UTF-8 api key, message = UTF-8 payload)).
const PREFIX = 'hmac-sha256=';

export function signPayload(payload: string, apiKey: string): string {
  return PREFIX + createHmac('sha256', apiKey).update(payload, 'utf8').digest('hex');
}

export function verifyPayload(payload: string, signature: string | null | undefined, apiKey: string): boolean {
  if (!signature || !signature.startsWith(PREFIX)) return false;
  const given = Buffer.from(signature.slice(PREFIX.length), 'hex');
  const expected = createHmac('sha256', apiKey).update(payload, 'utf8').digest();
  return given.length === expected.length && timingSafeEqual(given, expected);
}

export function safeEqual(a: string, b: string): boolean {
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && timingSafeEqual(x, y);
}

export type SignedUrlCheck =
  | { ok: true; params: URLSearchParams }
  | { ok: false; reason: 'unsigned' | 'bad-signature' | 'expired' };

// `generateSignedURL` (same source) appends `expires` (ms since epoch) and the
// data params to the URL, signs `url.toString()`, then appends `signature` last.
// So the signed text is exactly the URL the client requested, minus that final
// `&signature=...`. `origin` must be the origin the client addressed (its Host).
export function checkSignedUrl(origin: string, pathAndQuery: string, apiKey: string, now = Date.now()): SignedUrlCheck {
  const at = pathAndQuery.lastIndexOf('&signature=');
  if (at < 0) return { ok: false, reason: 'unsigned' };
  const encoded = pathAndQuery.slice(at + '&signature='.length);
  if (encoded.includes('&')) return { ok: false, reason: 'bad-signature' };
  let signature: string;
  try {
    signature = decodeURIComponent(encoded.replace(/\+/g, ' '));
  } catch {
    return { ok: false, reason: 'bad-signature' };
  }
  const signedPart = pathAndQuery.slice(0, at);
  if (!verifyPayload(origin + signedPart, signature, apiKey)) return { ok: false, reason: 'bad-signature' };
  const params = new URL(signedPart, origin).searchParams;
  const expires = Number(params.get('expires'));
  if (!Number.isFinite(expires) || expires < now) return { ok: false, reason: 'expired' };
  return { ok: true, params };
}

// Data params are encodeURIComponent'd by the SDK before URLSearchParams encodes
// them again, so one more decode is needed after reading them.
export function readDataParam(params: URLSearchParams, name: string): string | undefined {
  const raw = params.get(name);
  if (raw == null) return undefined;
  try {
    return decodeURIComponent(raw);
  } catch {
    return undefined;
  }
}
