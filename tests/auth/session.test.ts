import { eq } from 'drizzle-orm';
import { afterAll, afterEach, describe, expect, it, vi } from 'vitest';
import { memberships, sessions } from '../../db/schema';
import { ARGON2_OPTIONS, hashPassword, verifyPassword } from '../../lib/auth/password';
import { roleAtLeast } from '../../lib/auth/roles';
import { createUserSession, validateSessionToken } from '../../lib/auth/session';
import { sha256Hex } from '../../lib/auth/tokens';
import { changeRole } from '../../lib/team/members';
import { signUp } from '../../lib/team/signUp';
import { freshDb } from '../support/db';

describe('sessions, passwords and roles (in-process, fresh database)', () => {
  const { database, cleanup } = freshDb();
  afterAll(cleanup);
  afterEach(() => vi.useRealTimers());

  it('hashes passwords with argon2id at least at the OWASP minimum (m=19 MiB, t=2, p=1)', async () => {
    // OWASP Password Storage Cheat Sheet, argon2id: m=19456 KiB, t=2, p=1.
    const h = await hashPassword('a long enough password');
    expect(h).toMatch(/^\$argon2id\$v=19\$m=(\d+),t=(\d+),p=(\d+)\$/);
    const [, m, t, p] = h.match(/m=(\d+),t=(\d+),p=(\d+)/)!.map(Number);
    expect(m).toBeGreaterThanOrEqual(19456);
    expect(t).toBeGreaterThanOrEqual(2);
    expect(p).toBe(1);
    expect(ARGON2_OPTIONS.memoryCost).toBe(19456);
    expect(await verifyPassword(h, 'a long enough password')).toBe(true);
    expect(await verifyPassword(h, 'a wrong password')).toBe(false);
  });

  it('stores only the SHA-256 of the token: a sessions row is not a usable token', async () => {
    const owner = await signUp(database, { email: 'hash@example.test', password: 'pw-long-enough', name: 'H', teamName: 'Shop H' });
    const { token } = await createUserSession(database, owner.user.id);
    const row = database.select().from(sessions).where(eq(sessions.userId, owner.user.id)).get()!;
    expect(row.id).toBe(sha256Hex(token));
    expect(row.id).not.toBe(token);
    expect((await validateSessionToken(database, token)).user?.id).toBe(owner.user.id);
    expect((await validateSessionToken(database, row.id)).user).toBeNull();
  });

  it('ends a session after the idle lifetime (fake clock)', async () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date('2026-06-01T08:00:00Z'));
    const owner = await signUp(database, { email: 'idle@example.test', password: 'pw-long-enough', name: 'I', teamName: 'Shop I' });
    const { token } = await createUserSession(database, owner.user.id);
    vi.setSystemTime(new Date('2026-06-02T08:00:00Z'));
    // Early in the lifetime the session is not extended…
    expect((await validateSessionToken(database, token)).fresh).toBe(false);
    vi.setSystemTime(new Date('2026-06-10T08:00:00Z'));
    // …past half of it, it slides (and the app re-sets the cookie's expiry).
    const mid = await validateSessionToken(database, token);
    expect(mid.user).not.toBeNull();
    expect(mid.fresh).toBe(true);
    // 15 days idle > the 14-day sliding lifetime.
    vi.setSystemTime(new Date('2026-06-25T08:00:01Z'));
    expect((await validateSessionToken(database, token)).user).toBeNull();
  });

  it('ends an active session at the absolute lifetime (fake clock)', async () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    const start = new Date('2026-07-01T08:00:00Z').getTime();
    vi.setSystemTime(start);
    const owner = await signUp(database, { email: 'abs@example.test', password: 'pw-long-enough', name: 'A', teamName: 'Shop A' });
    const { token } = await createUserSession(database, owner.user.id);
    // Used every 5 days: the sliding expiry keeps moving, the absolute one does not.
    for (let day = 5; day < 30; day += 5) {
      vi.setSystemTime(start + day * 86400_000);
      expect((await validateSessionToken(database, token)).user, `day ${day}`).not.toBeNull();
    }
    vi.setSystemTime(start + 30 * 86400_000 + 1000);
    expect((await validateSessionToken(database, token)).user).toBeNull();
  });

  it('a role change ends that member\'s sessions', async () => {
    const owner = await signUp(database, { email: 'rc-owner@example.test', password: 'pw-long-enough', name: 'O', teamName: 'Shop RC' });
    const other = await signUp(database, { email: 'rc-other@example.test', password: 'pw-long-enough', name: 'P', teamName: 'Shop P' });
    // Move "other" into the owner's shop as a maker.
    database.update(memberships).set({ teamId: owner.team.id, role: 'maker' }).where(eq(memberships.userId, other.user.id)).run();
    const { token } = await createUserSession(database, other.user.id);
    expect((await validateSessionToken(database, token)).user).not.toBeNull();
    changeRole(database, owner, other.user.id, 'lead');
    expect((await validateSessionToken(database, token)).user).toBeNull();
  });

  it('orders the roles owner > lead > maker > viewer', () => {
    const expected: Record<string, string[]> = {
      owner: ['owner', 'lead', 'maker', 'viewer'],
      lead: ['lead', 'maker', 'viewer'],
      maker: ['maker', 'viewer'],
      viewer: ['viewer'],
    };
    for (const role of ['owner', 'lead', 'maker', 'viewer'] as const) {
      for (const needed of ['owner', 'lead', 'maker', 'viewer'] as const) {
        expect(roleAtLeast(role, needed), `${role} ≥ ${needed}`).toBe(expected[role]!.includes(needed));
      }
    }
  });
});
