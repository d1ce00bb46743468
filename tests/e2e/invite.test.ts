import { describe, expect, inject, it } from 'vitest';
import { artifactPath, browserAvailable, signedInPage, useBrowser } from '../support/browser';
import { DEMO_TEAM } from '../../scripts/seed/seed-demo';
import { api, baseUrl, signInAs, uniqueEmail } from '../support/http';

type Stored = { to: string[]; subject: string; text: string; html: string | null };

// The owner invites an address; the e-mail reaches the SMTP stand-in with a plain-text
// part holding the link; a browser follows it, joins, and the session has the invited role.
describe.runIf(browserAvailable())('browser: accept an e-mailed invitation', () => {
  const browser = useBrowser();

  it('delivers the invitation by e-mail and lets the invitee join as lead', async () => {
    const owner = await signInAs('owner@demo.test', 'pourproof-demo', '10.63.0.1');
    const email = uniqueEmail('invitee');
    const inv = await api('/api/team/invitations', { body: { email, role: 'lead' }, cookie: owner });
    expect(inv.status).toBe(201);

    let message: Stored | undefined;
    await expect
      .poll(
        async () => {
          const res = await fetch(`${inject('mailUrl')}/messages?to=${encodeURIComponent(email)}`);
          message = ((await res.json()) as Stored[])[0];
          return message?.subject;
        },
        { timeout: 15_000, interval: 200 },
      )
      .toBe(`You're invited to ${DEMO_TEAM} on Pourproof`);
    expect(message!.to).toEqual([email]);
    const link = /https?:\/\/\S+\/invite\/[0-9a-f]{40}/.exec(message!.text)?.[0];
    expect(link, message!.text).toBeDefined();
    expect(link!.startsWith(`${baseUrl()}/invite/`)).toBe(true);

    // The dev mailbox (API and page) shows the same message to the team.
    const mailbox = await api('/api/dev/mailbox', { cookie: owner });
    expect(mailbox.status).toBe(200);
    const listed = mailbox.body.find((m: { to: string; text: string }) => m.text.includes(link!));
    expect(listed).toBeTruthy();
    expect(listed.to).toBe(email);
    expect(Object.keys(listed).sort()).toEqual(expect.arrayContaining(['at', 'subject', 'text', 'to']));

    const context = await browser().newContext({ viewport: { width: 390, height: 844 } });
    const page = await context.newPage();
    await page.goto(link!);
    await page.getByRole('heading', { name: /^Join / }).waitFor();
    expect(await page.getByText('Invited as').textContent()).toContain('lead');
    await page.getByLabel('Your name').fill('Invited Lead');
    await page.getByLabel('Choose a password').fill('a lead password 42');
    await page.getByRole('button', { name: 'Join the shop' }).click();
    await page.waitForURL(/\/matches$/);

    const cookies = await context.cookies(baseUrl());
    const session = cookies.find((c) => c.name === 'pourproof_session');
    expect(session).toBeDefined();
    const me = await api('/api/me', { cookie: `${session!.name}=${session!.value}` });
    expect(me.status).toBe(200);
    expect(me.body).toMatchObject({ user: { email, name: 'Invited Lead' }, role: 'lead' });

    await context.close();

    // The mailbox page shows the shop's owner the message with its link clickable.
    const ownerPage = await signedInPage(browser(), baseUrl(), 'owner@demo.test', { width: 390, height: 844 });
    await ownerPage.goto(`${baseUrl()}/dev/mailbox`);
    const linkOnPage = ownerPage.getByRole('link', { name: link! });
    await linkOnPage.first().waitFor();
    expect(await linkOnPage.first().getAttribute('href')).toBe(link);
    await ownerPage.screenshot({ path: artifactPath('mailbox-390.png'), fullPage: true });
    await ownerPage.context().close();
  });
});
