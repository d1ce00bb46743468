import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import nodemailer from 'nodemailer';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { type MailFake, startMailFake } from '../../mail-fake/server';
import type { StoredMessage } from '../../mail-fake/store';

describe('SMTP stand-in', () => {
  let dir: string;
  let store: string;
  let fake: MailFake;

  const start = () => startMailFake({ smtpPort: 0, httpPort: 0, store, log: () => {} });
  const messages = async (query = '') => {
    const res = await fetch(`${fake.url}/messages${query}`);
    expect(res.status).toBe(200);
    return (await res.json()) as StoredMessage[];
  };
  const send = (to: string, subject: string, text: string, html?: string) =>
    nodemailer
      .createTransport({ host: '127.0.0.1', port: fake.smtpPort, secure: false })
      .sendMail({ from: 'Pourproof <no-reply@pourproof.test>', to, bcc: 'audit@pourproof.test', subject, text, html });

  beforeAll(async () => {
    dir = await mkdtemp(path.join(tmpdir(), 'pourproof-mail-'));
    store = path.join(dir, 'mail', 'messages.jsonl');
    fake = await start();
  });
  afterAll(async () => {
    await fake.close();
    await rm(dir, { recursive: true, force: true });
  });

  it('keeps a message sent by nodemailer, with its plain-text part, newest first', async () => {
    await send('lead@studio.test', 'Sign-off requested', 'Match #12 needs your sign-off.', '<p>Match #12</p>');
    await send('maker@studio.test', 'Decision: approved', 'Your match was approved.');

    const list = await messages();
    expect(list.map((m) => m.subject)).toEqual(['Decision: approved', 'Sign-off requested']);
    const signOff = list[1];
    expect(signOff.to).toEqual(['lead@studio.test', 'audit@pourproof.test']);
    expect(signOff.from).toContain('no-reply@pourproof.test');
    expect(signOff.text.trim()).toBe('Match #12 needs your sign-off.');
    expect(signOff.html).toContain('<p>Match #12</p>');
    expect(list[0].html).toBeNull();
    expect(Number.isNaN(Date.parse(signOff.at))).toBe(false);

    const forMaker = await messages('?to=MAKER@studio.test');
    expect(forMaker.map((m) => m.subject)).toEqual(['Decision: approved']);
  });

  it('keeps messages across a restart, and DELETE clears them for good', async () => {
    await fake.close();
    fake = await start();
    expect((await messages()).map((m) => m.subject)).toEqual(['Decision: approved', 'Sign-off requested']);

    expect((await fetch(`${fake.url}/messages`, { method: 'DELETE' })).status).toBe(204);
    expect(await messages()).toEqual([]);
    await fake.close();
    fake = await start();
    expect(await messages()).toEqual([]);
  });
});
