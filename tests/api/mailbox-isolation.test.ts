import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, inject, it } from 'vitest';
import { waitForMail } from '../support/mail';
import { api, expectErrorShape, signInAs, signUpShop, uniqueEmail } from '../support/http';

type Listed = { to: string; subject: string; text: string };

// The development mailbox shows a shop's owner the shop's own mail only: a
// stranger who signs up must not read another shop's invitation link.
describe('the development mailbox between shops', () => {
  it("shows each owner their own shop's mail and never another's", async () => {
    const shopA = await signUpShop('Mailbox shop A');
    const shopB = await signUpShop('Mailbox shop B');
    const inviteeA = uniqueEmail('invitee-a');
    const inviteeB = uniqueEmail('invitee-b');
    expect((await api('/api/team/invitations', { body: { email: inviteeA, role: 'lead' }, cookie: shopA.cookie })).status).toBe(201);
    expect((await api('/api/team/invitations', { body: { email: inviteeB, role: 'maker' }, cookie: shopB.cookie })).status).toBe(201);
    await waitForMail(inviteeA);
    await waitForMail(inviteeB);

    const boxA = await api<Listed[]>('/api/dev/mailbox', { cookie: shopA.cookie });
    const boxB = await api<Listed[]>('/api/dev/mailbox', { cookie: shopB.cookie });
    expect(boxA.status).toBe(200);
    expect(boxB.status).toBe(200);
    expect(boxA.body.map((m) => m.to)).toEqual([inviteeA]);
    expect(boxB.body.map((m) => m.to)).toEqual([inviteeB]);
    expect(boxA.body[0]!.text).toMatch(/\/invite\/[0-9a-f]{40}/);

    // The demo shop's owner sees its own mail, none of the new shops'.
    const demoOwner = await signInAs('owner@demo.test', 'pourproof-demo', '10.64.0.1');
    const demo = await api<Listed[]>('/api/dev/mailbox', { cookie: demoOwner });
    expect(demo.status).toBe(200);
    expect(demo.body.length).toBeGreaterThan(0);
    expect(demo.body.some((m) => m.to === inviteeA || m.to === inviteeB)).toBe(false);
  });

  it.each(['lead', 'maker', 'viewer'])('refuses a %s with 403', async (role) => {
    const cookie = await signInAs(`${role}@demo.test`, 'pourproof-demo', '10.64.0.2');
    const res = await api('/api/dev/mailbox', { cookie });
    expect(res.status).toBe(403);
    expectErrorShape(res.body);
  });

  it('keeps invitation links out of the app log', async () => {
    const shop = await signUpShop('Log shop');
    const invitee = uniqueEmail('logged');
    expect((await api('/api/team/invitations', { body: { email: invitee, role: 'viewer' }, cookie: shop.cookie })).status).toBe(201);
    const mail = await waitForMail(invitee);
    const link = /\/invite\/[0-9a-f]{40}/.exec(mail.text)![0];
    const log = fs.readFileSync(path.join(inject('tmpDir'), 'app.log'), 'utf8');
    expect(log).not.toContain(link);
    expect(log).not.toContain(invitee);
  });
});
