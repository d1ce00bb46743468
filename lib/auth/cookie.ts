import 'server-only';
import { cookies } from 'next/headers';
import { db } from '@/db';
import { SESSION_COOKIE } from './lucia';
import { luciaFor } from './session';

export async function setSessionCookie(token: string) {
  const c = luciaFor(db()).createSessionCookie(token);
  (await cookies()).set(c.name, c.value, c.attributes);
}

export async function clearSessionCookie() {
  const c = luciaFor(db()).createBlankSessionCookie();
  (await cookies()).set(c.name, c.value, c.attributes);
}

export async function readSessionToken(): Promise<string | undefined> {
  return (await cookies()).get(SESSION_COOKIE)?.value;
}
