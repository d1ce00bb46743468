import { mkdtemp, rm } from 'node:fs/promises';
import net from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { eq } from 'drizzle-orm';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { outgoingMail } from '../../db/schema';
import { type MailFake, startMailFake } from '../../mail-fake/server';
import { resetEnvForTests } from '../../lib/env';
import { deliverDue, deliverOne } from '../../lib/mail/queue';
import { createInvitation } from '../../lib/team/invitations';
import { signUp } from '../../lib/team/signUp';
import { freshDb } from '../support/db';

// In-process, on a fresh database: an invitation made while the SMTP server is
// down is still created, its e-mail stays queued after one failed attempt, and
// the retry pass delivers it once a server answers on that port.

async function closedPort(): Promise<number> {
  const srv = net.createServer();
  await new Promise<void>((r) => srv.listen(0, '127.0.0.1', () => r()));
  const { port } = srv.address() as net.AddressInfo;
  await new Promise<void>((r) => srv.close(() => r()));
  return port;
}

describe('e-mail while the SMTP server is unreachable', () => {
  const savedSmtp = process.env.SMTP_URL;
  let db: ReturnType<typeof freshDb>;
  let dir: string;
  let fake: MailFake | undefined;

  beforeAll(async () => {
    db = freshDb();
    dir = await mkdtemp(path.join(tmpdir(), 'pourproof-mail-retry-'));
  });
  afterEach(async () => {
    await fake?.close();
    fake = undefined;
  });
  afterAll(async () => {
    process.env.SMTP_URL = savedSmtp;
    resetEnvForTests();
    db.cleanup();
    await rm(dir, { recursive: true, force: true });
  });

  it('creates the invitation, keeps the message queued with attempts=1, then delivers it on retry', async () => {
    const port = await closedPort();
    process.env.SMTP_URL = `smtp://127.0.0.1:${port}`;
    resetEnvForTests();
    const owner = await signUp(db.database, { email: 'owner@retry.test', password: 'long enough pw', name: 'Retry Owner', teamName: 'Retry shop' });

    const inv = await createInvitation(db.database, owner, { email: 'new-maker@retry.test', role: 'maker' }, 'http://app.test');
    expect(inv.link).toMatch(/^http:\/\/app\.test\/invite\/[0-9a-f]{40}$/);
    const row = () => db.database.select().from(outgoingMail).where(eq(outgoingMail.to, 'new-maker@retry.test')).get()!;
    // The first send runs in the background; wait for it to fail.
    await expect.poll(() => row().attempts, { timeout: 10_000, interval: 50 }).toBe(1);
    expect(row()).toMatchObject({ status: 'queued', sentAt: null });
    expect(row().lastError).toMatch(/ECONNREFUSED/);
    expect(row().nextAttemptAt).toBeGreaterThan(Date.now());

    // Not due yet: a retry pass now sends nothing.
    expect(await deliverDue(db.database)).toBe(0);

    fake = await startMailFake({ smtpPort: port, httpPort: 0, dataDir: dir, log: () => {} });
    expect(await deliverDue(db.database, Date.now() + 10 * 60_000)).toBe(1);
    expect(row()).toMatchObject({ status: 'sent', attempts: 2, lastError: null });

    const list = (await (await fetch(`${fake.url}/messages?to=new-maker@retry.test`)).json()) as { subject: string; text: string }[];
    expect(list).toHaveLength(1);
    expect(list[0].subject).toBe("You're invited to Retry shop on Pourproof");
    expect(list[0].text).toContain(inv.link);
  });

  it('sends a message once when two passes reach it at the same time (the row is claimed before sending)', async () => {
    fake = await startMailFake({ smtpPort: 0, httpPort: 0, dataDir: dir, log: () => {} });
    await fetch(`${fake.url}/messages`, { method: 'DELETE' });
    process.env.SMTP_URL = `smtp://127.0.0.1:${fake.smtpPort}`;
    resetEnvForTests();
    const id = 'race-row-1';
    db.database.insert(outgoingMail).values({ id, teamId: null, to: 'race@retry.test', subject: 'Once', text: 'Sent once.', nextAttemptAt: Date.now() }).run();
    const results = await Promise.all([deliverDue(db.database), deliverDue(db.database), deliverOne(db.database, id)]);
    expect(results.map(Number).reduce((a, b) => a + b, 0)).toBe(1);
    const list = (await (await fetch(`${fake.url}/messages?to=race@retry.test`)).json()) as unknown[];
    expect(list).toHaveLength(1);
    expect(db.database.select().from(outgoingMail).where(eq(outgoingMail.id, id)).get()).toMatchObject({ status: 'sent', attempts: 1 });
  });
});
