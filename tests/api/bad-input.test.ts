import { describe, expect, it } from 'vitest';
import { api, expectErrorShape, signInAs } from '../support/http';

const LONG_EMAIL = `${'a'.repeat(10_000)}@example.test`;

// Every route of the foundation answers bad input with 400 and the one error
// shape, never a 500.
const CASES: { route: string; needsOwner?: boolean; bodies: [string, string][] }[] = [
  {
    route: '/api/auth/sign-up',
    bodies: [
      ['malformed JSON', '{"email": '],
      ['empty body', ''],
      ['array', '[]'],
      ['wrong types', JSON.stringify({ email: 42, password: true, name: [], teamName: {} })],
      ['missing fields', JSON.stringify({ email: 'x@example.test' })],
      ['10 KB e-mail', JSON.stringify({ email: LONG_EMAIL, password: 'long enough pw', name: 'N', teamName: 'T' })],
      ['short password', JSON.stringify({ email: 'short@example.test', password: 'short', name: 'N', teamName: 'T' })],
      ['not an e-mail', JSON.stringify({ email: 'not-an-email', password: 'long enough pw', name: 'N', teamName: 'T' })],
    ],
  },
  {
    route: '/api/auth/sign-in',
    bodies: [
      ['malformed JSON', '{{'],
      ['empty body', ''],
      ['wrong types', JSON.stringify({ email: 1, password: 2 })],
      ['missing fields', JSON.stringify({})],
      ['10 KB e-mail', JSON.stringify({ email: LONG_EMAIL, password: 'x' })],
      ['null', 'null'],
    ],
  },
  {
    route: '/api/team/invitations',
    needsOwner: true,
    bodies: [
      ['malformed JSON', '{"email"'],
      ['wrong types', JSON.stringify({ email: 5, role: 7 })],
      ['missing fields', JSON.stringify({})],
      ['unknown role', JSON.stringify({ email: 'someone@example.test', role: 'boss' })],
      ['10 KB e-mail', JSON.stringify({ email: LONG_EMAIL, role: 'maker' })],
    ],
  },
];

describe('bad input gets 400 in the one error shape', () => {
  for (const c of CASES) {
    it(c.route, async () => {
      const cookie = c.needsOwner ? await signInAs('owner@demo.test', 'pourproof-demo', '10.50.0.1') : undefined;
      for (const [label, raw] of c.bodies) {
        const res = await api(c.route, { raw, cookie, headers: { 'x-forwarded-for': '10.50.0.2' } });
        expect(res.status, `${c.route} ${label}`).toBe(400);
        expectErrorShape(res.body);
        expect(res.body.error.message.length, label).toBeLessThan(300);
      }
    });
  }

  it('reports which field is wrong', async () => {
    const res = await api('/api/auth/sign-up', { body: { email: 'ok@example.test', password: 'long enough pw', name: 'N' } });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/teamName/);
  });

  it('answers an unknown session cookie with 401 on reads', async () => {
    for (const route of ['/api/me', '/api/matches', '/api/colorants', '/api/molds']) {
      const res = await api(route, { cookie: 'pourproof_session=garbage' });
      expect(res.status, route).toBe(401);
      expectErrorShape(res.body);
    }
  });
});
