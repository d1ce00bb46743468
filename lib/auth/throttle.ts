import 'server-only';
import { and, count, eq, gt, lte, max } from 'drizzle-orm';
import type { DB } from '@/db/open';
import { signInFailures } from '@/db/schema';
import { env } from '@/lib/env';
import { ApiError } from '@/lib/http/api';

// Sign-in throttling that slows guessing down without letting a stranger lock a
// member out, after the OWASP Authentication Cheat Sheet ("Account Lockout":
// lock-outs let an attacker deny service to the account's owner; prefer
// throttling by account *and* address, and exponential delays to hard locks).
//
// Failures are counted over a sliding window under three keys:
// - pair (account + address): past SIGN_IN_PAIR_FAILURES, that address must wait
//   before its next try for that account, 30 s doubling with each further
//   failure (up to the window) — a slow-down, not a lock;
// - address (across accounts): past SIGN_IN_ADDRESS_FAILURES, the same delay for
//   every account from that address (password spraying);
// - account (across addresses): past SIGN_IN_MAX_FAILURES the account is under
//   attack, and an address that has already failed on it must wait after a single
//   failure. An address that has not failed on the account is never delayed by
//   the account's count, so the member signs in from their own phone while a
//   stranger guesses elsewhere; a distributed guesser gets one try per address.
// A right password clears the pair only: the account stays guarded while the
// attack goes on.

const BASE_DELAY_MS = 30_000;
const HOUR_MS = 3_600_000;

export function throttleSettings() {
  const e = env();
  return { pair: e.SIGN_IN_PAIR_FAILURES, address: e.SIGN_IN_ADDRESS_FAILURES, account: e.SIGN_IN_MAX_FAILURES, windowMs: e.SIGN_IN_WINDOW_MIN * 60_000 };
}

export type ThrottleKeys = { account: string; pair: string | null; address: string | null };

export function throttleKeys(email: string, ip: string | null): ThrottleKeys {
  const account = email.trim().toLowerCase();
  return { account: `email:${account}`, pair: ip ? `pair:${account}|${ip}` : null, address: ip ? `ip:${ip}` : null };
}

function failuresOf(database: DB, key: string, since: number) {
  const row = database
    .select({ n: count(), last: max(signInFailures.at) })
    .from(signInFailures)
    .where(and(eq(signInFailures.key, key), gt(signInFailures.at, since)))
    .get();
  return { n: row?.n ?? 0, last: row?.last ?? 0 };
}

// Milliseconds still to wait after `n` failures, the last at `last`, when `free` are allowed.
function delayLeft(n: number, last: number, free: number, windowMs: number, now: number): number {
  if (n < free) return 0;
  const delay = Math.min(windowMs, BASE_DELAY_MS * 2 ** (n - free));
  return Math.max(0, last + delay - now);
}

/** Seconds to wait, or 0 when the attempt may go ahead. */
export function retryAfterSeconds(database: DB, keys: ThrottleKeys, now = Date.now()): number {
  const s = throttleSettings();
  const since = now - s.windowMs;
  const underAttack = failuresOf(database, keys.account, since).n >= s.account;
  let wait = 0;
  if (keys.pair) {
    const pair = failuresOf(database, keys.pair, since);
    wait = Math.max(wait, delayLeft(pair.n, pair.last, underAttack ? 1 : s.pair, s.windowMs, now));
  } else if (underAttack) {
    // No address to tell the member from the attacker: the account's own count decides.
    const acct = failuresOf(database, keys.account, since);
    wait = Math.max(wait, delayLeft(acct.n, acct.last, s.account, s.windowMs, now));
  }
  if (keys.address) {
    const addr = failuresOf(database, keys.address, since);
    wait = Math.max(wait, delayLeft(addr.n, addr.last, s.address, s.windowMs, now));
  }
  return Math.ceil(wait / 1000);
}

export function recordFailure(database: DB, keys: ThrottleKeys, now = Date.now()) {
  const { windowMs } = throttleSettings();
  database.transaction((tx) => {
    // Old rows go; rate limits of other actions (takeAttempt) count over an hour.
    tx.delete(signInFailures).where(lte(signInFailures.at, now - Math.max(windowMs, HOUR_MS))).run();
    for (const key of [keys.account, keys.pair, keys.address]) if (key) tx.insert(signInFailures).values({ key, at: now }).run();
  });
}

export function clearPairFailures(database: DB, keys: ThrottleKeys) {
  if (keys.pair) database.delete(signInFailures).where(eq(signInFailures.key, keys.pair)).run();
}

/**
 * A plain rate limit on an action per address (sign-up, invitation acceptance):
 * at most `limit` attempts in `windowMs`. Records this attempt when it is
 * allowed; answers the seconds to wait otherwise.
 */
export function takeAttempt(database: DB, key: string, limit: number, windowMs: number, now = Date.now()): number {
  return database.transaction((tx) => {
    const since = now - windowMs;
    const rows = tx
      .select({ at: signInFailures.at })
      .from(signInFailures)
      .where(and(eq(signInFailures.key, key), gt(signInFailures.at, since)))
      .orderBy(signInFailures.at)
      .all();
    if (rows.length >= limit) return Math.max(1, Math.ceil((rows[rows.length - limit]!.at + windowMs - now) / 1000));
    tx.insert(signInFailures).values({ key, at: now }).run();
    return 0;
  });
}

/** Sign-up and invitation acceptance: SIGN_UP_PER_HOUR per address, else 429 with Retry-After. */
export function assertAccountCreationAllowed(database: DB, ip: string | null) {
  if (!ip) return;
  const wait = takeAttempt(database, `create:${ip}`, env().SIGN_UP_PER_HOUR, HOUR_MS);
  if (wait > 0) {
    throw new ApiError(429, 'too_many_attempts', `Too many new accounts from this address; try again in ${Math.ceil(wait / 60)} min`, { 'Retry-After': String(wait) });
  }
}
