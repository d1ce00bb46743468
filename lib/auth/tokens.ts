import 'server-only';
import { createHash, randomBytes } from 'node:crypto';

// 160 bits of randomness as 40 hex digits: the token of a session cookie or an invitation link.
export function newToken(): string {
  return randomBytes(20).toString('hex');
}

export function sha256Hex(value: string): string {
  return createHash('sha256').update(value).digest('hex');
}
