import { createHash, randomBytes } from 'node:crypto';

// 160 bits of randomness, base32-ish (hex is fine and simple).
export function newToken(): string {
  return randomBytes(20).toString('hex');
}

export function sha256Hex(value: string): string {
  return createHash('sha256').update(value).digest('hex');
}

export function newId(): string {
  return randomBytes(12).toString('base64url');
}
