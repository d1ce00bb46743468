import 'server-only';
import { cookies, headers } from 'next/headers';
import { redirect } from 'next/navigation';
import { cache } from 'react';
import { db } from '@/db';
import type { Member } from '@/db/queries/members';
import type { Role } from '@/db/schema';
import { ApiError } from '@/lib/http/api';
import { SESSION_COOKIE } from './lucia';
import { roleAtLeast } from './roles';
import { luciaFor, validateSessionToken } from './session';

export type { Member };

// The session token from the request's Cookie header. The read-only headers are cheap;
// the mutable cookie jar of a route handler is built only when the cookie must move.
// (A token is 40 hex digits, so the value needs no decoding.)
function sessionToken(cookieHeader: string | null): string | undefined {
  if (!cookieHeader) return undefined;
  for (const part of cookieHeader.split(';')) {
    const eq = part.indexOf('=');
    if (eq > 0 && part.slice(0, eq).trim() === SESSION_COOKIE) return part.slice(eq + 1).trim();
  }
  return undefined;
}

// Reads the session cookie once per request and returns the member, or null.
export const getCurrentMember = cache(async (): Promise<Member | null> => {
  const token = sessionToken((await headers()).get('cookie'));
  if (!token) return null;
  const { member, fresh } = await validateSessionToken(db(), token);
  if (!member) return null;
  if (fresh) {
    // Lucia slid the session's expiry forward: move the cookie's with it.
    // Server components may not set cookies; the next action or API call will.
    const c = luciaFor(db()).createSessionCookie(token);
    try {
      (await cookies()).set(c.name, c.value, c.attributes);
    } catch {
      /* read-only cookies in a server component */
    }
  }
  return member;
});

// The one gate of every route handler and server action: 401 when signed
// out, 403 when the role is below what the action needs.
export async function requireRole(needed: Role = 'viewer'): Promise<Member> {
  const member = await getCurrentMember();
  if (!member) throw new ApiError(401, 'unauthenticated', 'Sign in first');
  if (!roleAtLeast(member.role, needed)) {
    throw new ApiError(403, 'forbidden', `This needs the ${needed} role or above; you are ${member.role}`);
  }
  return member;
}

export const requireMember = () => requireRole('viewer');

// For pages: signed-out visitors go to the sign-in page instead of an error.
export async function requirePageMember(needed: Role = 'viewer'): Promise<Member> {
  const member = await getCurrentMember();
  if (!member) redirect('/sign-in');
  if (!roleAtLeast(member.role, needed)) redirect('/matches');
  return member;
}
