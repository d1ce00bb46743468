import { and, eq, gt, inArray, lte } from 'drizzle-orm';
import type { DB } from '@/db/open';
import { signInFailures } from '@/db/schema';
import { env } from '@/lib/env';

// Failed sign-ins are counted per account and per client address over a
// sliding window; at the limit every attempt for that key is refused with 429
// until the oldest failure leaves the window.

export function throttleSettings() {
  const { SIGN_IN_MAX_FAILURES: max, SIGN_IN_WINDOW_MIN } = env();
  return { max, windowMs: SIGN_IN_WINDOW_MIN * 60_000 };
}

export function throttleKeys(email: string, ip: string | null): string[] {
  const keys = [`email:${email.toLowerCase()}`];
  if (ip) keys.push(`ip:${ip}`);
  return keys;
}

// Seconds to wait, or 0 when the attempt may go ahead.
export function retryAfterSeconds(database: DB, keys: string[], now = Date.now()): number {
  const { max, windowMs } = throttleSettings();
  let wait = 0;
  for (const key of keys) {
    const rows = database
      .select({ at: signInFailures.at })
      .from(signInFailures)
      .where(and(eq(signInFailures.key, key), gt(signInFailures.at, now - windowMs)))
      .orderBy(signInFailures.at)
      .all();
    if (rows.length >= max) {
      const oldest = rows[rows.length - max]!.at;
      wait = Math.max(wait, Math.ceil((oldest + windowMs - now) / 1000));
    }
  }
  return wait;
}

export function recordFailure(database: DB, keys: string[], now = Date.now()) {
  const { windowMs } = throttleSettings();
  database.transaction((tx) => {
    tx.delete(signInFailures).where(lte(signInFailures.at, now - windowMs)).run();
    for (const key of keys) tx.insert(signInFailures).values({ key, at: now }).run();
  });
}

export function clearFailures(database: DB, keys: string[]) {
  if (keys.length) database.delete(signInFailures).where(inArray(signInFailures.key, keys)).run();
}
