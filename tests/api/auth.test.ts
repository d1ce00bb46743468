import Database from 'better-sqlite3';
import { describe, expect, inject, it } from 'vitest';
import { api, expectErrorShape, signInAs, signUpShop, uniqueEmail } from '../support/http';

describe('sign-up, sign-in, sign-out over HTTP', () => {
  it('health answers once the database does', async () => {
    const res = await api('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true });
  });

  it('sign-up creates a shop with its owner and a session cookie', async () => {
    const email = uniqueEmail('signup');
    const res = await api('/api/auth/sign-up', { body: { email, password: 'long enough pw', name: 'Sam Owner', teamName: 'Shop One' } });
    expect(res.status).toBe(201);
    expect(res.body.role).toBe('owner');
    expect(res.body.user).toMatchObject({ email, name: 'Sam Owner' });
    expect(res.body.team).toMatchObject({ name: 'Shop One' });
    expect(res.headers.get('set-cookie')).toMatch(/HttpOnly/i);
    expect(res.headers.get('set-cookie')).toMatch(/SameSite=lax/i);
    const me = await api('/api/me', { cookie: res.cookie });
    expect(me.status).toBe(200);
    expect(me.body.team.id).toBe(res.body.team.id);
    const again = await api('/api/auth/sign-up', { body: { email, password: 'another long pw', name: 'X', teamName: 'Y' } });
    expect(again.status).toBe(409);
    expectErrorShape(again.body);
  });

  it('signs in every demo role through the API', async () => {
    for (const role of ['owner', 'lead', 'maker', 'viewer']) {
      const res = await api('/api/auth/sign-in', { body: { email: `${role}@demo.test`, password: 'pourproof-demo' }, headers: { 'x-forwarded-for': '10.9.0.1' } });
      expect(res.status, role).toBe(200);
      expect(res.body.role).toBe(role);
      expect(Object.keys(res.body.user).sort()).toEqual(['email', 'id', 'name']);
      expect(Object.keys(res.body.team).sort()).toEqual(['id', 'name']);
    }
  });

  it('answers a wrong password and an unknown e-mail with the same 401', async () => {
    const shop = await signUpShop();
    const wrong = await api('/api/auth/sign-in', { body: { email: shop.email, password: 'not the password' }, headers: { 'x-forwarded-for': '10.9.0.2' } });
    const unknown = await api('/api/auth/sign-in', { body: { email: uniqueEmail('nobody'), password: 'whatever pw' }, headers: { 'x-forwarded-for': '10.9.0.2' } });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
  });

  it('sign-out ends the session: the old cookie no longer works', async () => {
    const shop = await signUpShop();
    const cookie = await signInAs(shop.email, shop.password);
    expect((await api('/api/me', { cookie })).status).toBe(200);
    expect((await api('/api/auth/sign-out', { method: 'POST', cookie })).status).toBe(200);
    const after = await api('/api/me', { cookie });
    expect(after.status).toBe(401);
    expectErrorShape(after.body);
  });

  it('slows a guessed account down without locking its member out (OWASP Authentication Cheat Sheet, account lockout)', async () => {
    const shop = await signUpShop();
    for (let i = 0; i < 10; i++) {
      // A different address each time: a distributed guesser.
      const r = await api('/api/auth/sign-in', { body: { email: shop.email, password: `wrong ${i}` }, headers: { 'x-forwarded-for': `10.20.${i}.1` } });
      expect(r.status).toBe(401);
    }
    // The account is under attack: an address that has failed on it must wait…
    const again = await api('/api/auth/sign-in', { body: { email: shop.email, password: 'wrong again' }, headers: { 'x-forwarded-for': '10.20.3.1' } });
    expect(again.status).toBe(429);
    expectErrorShape(again.body);
    const retry = Number(again.headers.get('retry-after'));
    expect(retry).toBeGreaterThan(0);
    expect(retry).toBeLessThanOrEqual(15 * 60);
    // …even with the right password (it cannot tell the member from the guesser there)…
    const sameAddress = await api('/api/auth/sign-in', { body: { email: shop.email, password: shop.password }, headers: { 'x-forwarded-for': '10.20.3.1' } });
    expect(sameAddress.status).toBe(429);
    // …while the member, from an address that has not been failing, signs in.
    const member = await api('/api/auth/sign-in', { body: { email: shop.email, password: shop.password }, headers: { 'x-forwarded-for': '10.20.99.1' } });
    expect(member.status).toBe(200);
  });

  it('slows one address down after five wrong passwords for one account, with a growing wait', async () => {
    const shop = await signUpShop();
    const ip = '10.21.0.9';
    for (let i = 0; i < 5; i++) {
      const r = await api('/api/auth/sign-in', { body: { email: shop.email, password: `wrong ${i}` }, headers: { 'x-forwarded-for': ip } });
      expect(r.status).toBe(401);
    }
    const slowed = await api('/api/auth/sign-in', { body: { email: shop.email, password: shop.password }, headers: { 'x-forwarded-for': ip } });
    expect(slowed.status).toBe(429);
    expect(Number(slowed.headers.get('retry-after'))).toBeLessThanOrEqual(30);
    const elsewhere = await api('/api/auth/sign-in', { body: { email: shop.email, password: shop.password }, headers: { 'x-forwarded-for': '10.21.0.10' } });
    expect(elsewhere.status).toBe(200);
  });

  it('throttles failed sign-ins per address across accounts', async () => {
    const ip = '10.30.0.7';
    for (let i = 0; i < 10; i++) {
      const r = await api('/api/auth/sign-in', { body: { email: uniqueEmail('spray'), password: 'guess guess' }, headers: { 'x-forwarded-for': ip } });
      expect(r.status).toBe(401);
    }
    const shop = await signUpShop();
    const blocked = await api('/api/auth/sign-in', { body: { email: shop.email, password: shop.password }, headers: { 'x-forwarded-for': ip } });
    expect(blocked.status).toBe(429);
    expect(blocked.headers.get('retry-after')).toMatch(/^\d+$/);
  });

  it('a value copied from the sessions table is not a valid cookie', async () => {
    const shop = await signUpShop();
    const raw = new Database(inject('dbFile'), { readonly: true });
    const rows = raw.prepare('select s.id from sessions s join users u on u.id = s.user_id where u.email = ?').all(shop.email) as { id: string }[];
    raw.close();
    expect(rows.length).toBeGreaterThan(0);
    const token = shop.cookie.split('=')[1];
    expect(rows.map((r) => r.id)).not.toContain(token);
    const forged = await api('/api/me', { cookie: `pourproof_session=${rows[0]!.id}` });
    expect(forged.status).toBe(401);
  });

  it('refuses a mutating request with a foreign or missing Origin', async () => {
    const foreign = await api('/api/auth/sign-in', { body: { email: 'owner@demo.test', password: 'pourproof-demo' }, origin: 'http://evil.example' });
    expect(foreign.status).toBe(403);
    expectErrorShape(foreign.body);
    const missing = await api('/api/auth/sign-in', { body: { email: 'owner@demo.test', password: 'pourproof-demo' }, origin: null });
    expect(missing.status).toBe(403);
    expect(missing.body.error.code).toBe('bad_origin');
  });
});
