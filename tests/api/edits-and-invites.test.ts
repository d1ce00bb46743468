import { beforeAll, describe, expect, inject, it } from 'vitest';
import { api, baseUrl, expectErrorShape, signInAs, signUpShop, uniqueEmail } from '../support/http';
import type { StoredMail } from '../support/mail';

async function mailsTo(to: string): Promise<StoredMail[]> {
  const res = await fetch(`${inject('mailUrl')}/messages?to=${encodeURIComponent(to)}`);
  return (await res.json()) as StoredMail[];
}
async function waitForCount(to: string, n: number) {
  const until = Date.now() + 15_000;
  while (Date.now() < until) {
    const all = await mailsTo(to);
    if (all.length >= n) return all;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`fewer than ${n} e-mails to ${to}`);
}
const linkIn = (m: StoredMail) => m.text.match(/https?:\/\/\S+\/invite\/[0-9a-f]{40}/)![0];

describe('edit what may change: a match’s name, notes and tolerance; pending invitations', () => {
  let maker: string;
  let lead: string;
  let viewer: string;
  let owner: string;
  beforeAll(async () => {
    maker = await signInAs('maker@demo.test', 'pourproof-demo', '10.76.0.1');
    lead = await signInAs('lead@demo.test', 'pourproof-demo', '10.76.0.2');
    viewer = await signInAs('viewer@demo.test', 'pourproof-demo', '10.76.0.3');
    owner = await signInAs('owner@demo.test', 'pourproof-demo', '10.76.0.4');
  });

  it('renames a match, rewrites its notes and tolerance, and logs each change', async () => {
    const matchId = (await api('/api/matches', { cookie: maker, body: { name: 'Edit me', zones: ['back'], notes: 'first' } })).body.id;
    const res = await api(`/api/matches/${matchId}`, { cookie: maker, method: 'PATCH', body: { name: 'Dusk shad', notes: 'second', tolerance: 1.5 } });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ name: 'Dusk shad', notes: 'second', tolerance: 1.5 });
    const edits = await api(`/api/matches/${matchId}/edits`, { cookie: viewer });
    expect(edits.status).toBe(200);
    expect(edits.body).toHaveLength(1);
    expect(edits.body[0]).toMatchObject({
      by: 'Mika Feldspar',
      changes: { name: { from: 'Edit me', to: 'Dusk shad' }, notes: { from: 'first', to: 'second' }, tolerance: { from: 2, to: 1.5 } },
    });
    // Nothing changed, nothing logged; bad bodies and other roles are refused.
    expect((await api(`/api/matches/${matchId}`, { cookie: maker, method: 'PATCH', body: { name: 'Dusk shad' } })).status).toBe(200);
    expect((await api(`/api/matches/${matchId}/edits`, { cookie: maker })).body).toHaveLength(1);
    for (const [body, re] of [[{}, /give a name, notes or tolerance/], [{ tolerance: 0 }, /^tolerance: tolerance must be more than 0/], [{ name: '  ' }, /^name: name is required/]] as const) {
      const bad = await api(`/api/matches/${matchId}`, { cookie: maker, method: 'PATCH', body });
      expect(bad.status).toBe(400);
      expectErrorShape(bad.body);
      expect(bad.body.error.message).toMatch(re);
    }
    expect((await api(`/api/matches/${matchId}`, { cookie: viewer, method: 'PATCH', body: { name: 'x' } })).status).toBe(403);
    const stranger = await signUpShop('Edit stranger');
    expect((await api(`/api/matches/${matchId}`, { cookie: stranger.cookie, method: 'PATCH', body: { name: 'x' } })).status).toBe(404);
    expect((await api(`/api/matches/${matchId}/edits`, { cookie: stranger.cookie })).status).toBe(404);
    expect((await api(`/api/matches/${matchId}`, { cookie: lead })).body.name).toBe('Dusk shad');
  });

  it('re-sends a pending invitation with a new link and revokes one; only the owner may', async () => {
    const email = uniqueEmail('invitee');
    const made = await api('/api/team/invitations', { cookie: owner, body: { email, role: 'maker' } });
    expect(made.status).toBe(201);
    const first = linkIn((await waitForCount(email, 1))[0]!);

    expect((await api(`/api/team/invitations/${made.body.id}/resend`, { cookie: lead, method: 'POST' })).status).toBe(403);
    const again = await api(`/api/team/invitations/${made.body.id}/resend`, { cookie: owner, method: 'POST' });
    expect(again.status).toBe(200);
    expect(again.body).toMatchObject({ id: made.body.id, email, role: 'maker' });
    const mails = await waitForCount(email, 2);
    const second = linkIn(mails[0]!);
    expect(second).not.toBe(first);
    const page = async (link: string) => (await fetch(link.replace(/^https?:\/\/[^/]+/, baseUrl()))).text();
    expect(await page(first)).toContain('It is unknown, already used or expired');
    expect(await page(second)).not.toContain('It is unknown, already used or expired');

    expect((await api(`/api/team/invitations/${made.body.id}`, { cookie: maker, method: 'DELETE' })).status).toBe(403);
    const revoked = await api(`/api/team/invitations/${made.body.id}`, { cookie: owner, method: 'DELETE' });
    expect(revoked.status).toBe(200);
    expect(await page(second)).toContain('It is unknown, already used or expired');
    const twice = await api(`/api/team/invitations/${made.body.id}/resend`, { cookie: owner, method: 'POST' });
    expect(twice.status).toBe(409);
    expectErrorShape(twice.body);
    const stranger = await signUpShop('Invite stranger');
    expect((await api(`/api/team/invitations/${made.body.id}`, { cookie: stranger.cookie, method: 'DELETE' })).status).toBe(404);
  });
});
