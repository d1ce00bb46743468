import { describe, expect, inject, it } from 'vitest';
import { api, expectErrorShape, signInAs, signUpShop, uniqueEmail } from '../support/http';
import { waitForMail } from '../support/mail';

describe('roles and team scoping', () => {
  it('lets only the owner invite: lead, maker and viewer get 403, no session 401', async () => {
    for (const role of ['lead', 'maker', 'viewer']) {
      const cookie = await signInAs(`${role}@demo.test`, 'pourproof-demo', '10.40.0.1');
      const res = await api('/api/team/invitations', { body: { email: uniqueEmail('inv'), role: 'maker' }, cookie });
      expect(res.status, role).toBe(403);
      expectErrorShape(res.body);
    }
    const anon = await api('/api/team/invitations', { body: { email: uniqueEmail('inv'), role: 'maker' } });
    expect(anon.status).toBe(401);
    const owner = await signInAs('owner@demo.test', 'pourproof-demo', '10.40.0.1');
    const email = uniqueEmail('invited');
    const ok = await api('/api/team/invitations', { body: { email, role: 'lead' }, cookie: owner });
    expect(ok.status).toBe(201);
    expect(ok.body).toMatchObject({ email, role: 'lead' });
    expect(typeof ok.body.id).toBe('string');
  });

  it('answers 404 for another team\'s match, exactly as for a missing id', async () => {
    const maker = await signInAs('maker@demo.test', 'pourproof-demo', '10.40.0.2');
    const demoMatches = await api('/api/matches', { cookie: maker });
    expect(demoMatches.status).toBe(200);
    expect(demoMatches.body.length).toBeGreaterThan(0);
    const demoMatchId = demoMatches.body[0].id;
    expect((await api(`/api/matches/${demoMatchId}`, { cookie: maker })).status).toBe(200);

    const stranger = await signUpShop('Other shop');
    const theirs = await api(`/api/matches/${demoMatchId}`, { cookie: stranger.cookie });
    const missing = await api('/api/matches/no-such-id', { cookie: stranger.cookie });
    expect(theirs.status).toBe(404);
    expect(missing.status).toBe(404);
    expect(theirs.body).toEqual(missing.body);
    const list = await api('/api/matches', { cookie: stranger.cookie });
    expect(list.body).toEqual([]);
    const colorants = await api('/api/colorants', { cookie: stranger.cookie });
    expect(colorants.body).toEqual([]);
  });

  it('ends a member\'s sessions when the owner changes their role', async () => {
    // The owner invites; the link arrives in the SMTP stand-in; the invitee
    // joins through the acceptance library on the same database file, signs
    // in, and loses that session when the owner changes the role.
    const { acceptInvitation } = await import('../../lib/team/invitations');
    const { changeRole } = await import('../../lib/team/members');
    const { openDatabase } = await import('../../db/open');
    const owner = await signUpShop('Role shop');
    const email = uniqueEmail('member');
    expect((await api('/api/team/invitations', { body: { email, role: 'maker' }, cookie: owner.cookie })).status).toBe(201);
    const mail = await waitForMail(email, /invited/);
    const token = mail.text.match(/\/invite\/([0-9a-f]{40})/)![1]!;
    const database = openDatabase(inject('dbFile'));
    try {
      const accepted = await acceptInvitation(database, token, { name: 'New Maker', password: 'maker password 1' });
      const cookie = await signInAs(email, 'maker password 1', '10.40.0.3');
      expect((await api('/api/me', { cookie })).body.role).toBe('maker');
      const me = (await api('/api/me', { cookie: owner.cookie })).body;
      changeRole(database, me, accepted.userId, 'viewer');
      expect((await api('/api/me', { cookie })).status).toBe(401);
      const again = await signInAs(email, 'maker password 1', '10.40.0.3');
      expect((await api('/api/me', { cookie: again })).body.role).toBe('viewer');
    } finally {
      database.$client.close();
    }
  });
});
