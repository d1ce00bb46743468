import { randomBytes } from 'node:crypto';

// A record's id: 96 random bits, base64url (16 characters).
export function newId(): string {
  return randomBytes(12).toString('base64url');
}
