import { afterEach, describe, expect, it } from 'vitest';
import { resetEnvForTests } from '../../lib/env';

// The development mailbox page exists only with dev tools on and the mail stand-in
// configured; otherwise it is a 404 (next/navigation notFound), checked before any
// session is read. The page with messages is exercised in tests/e2e/invite.test.ts.
describe('the dev mailbox page', () => {
  const saved = { tools: process.env.POURPROOF_DEV_TOOLS, fake: process.env.MAIL_FAKE_URL };
  afterEach(() => {
    for (const [key, value] of [['POURPROOF_DEV_TOOLS', saved.tools], ['MAIL_FAKE_URL', saved.fake]] as const) {
      if (value === undefined) delete process.env[key];
      else process.env[key] = value;
    }
    resetEnvForTests();
  });

  it.each([
    { label: 'dev tools off', tools: '0', fake: 'http://127.0.0.1:3102' },
    { label: 'no mail stand-in', tools: '1', fake: undefined },
  ])('is not found with $label', async ({ tools, fake }) => {
    process.env.POURPROOF_DEV_TOOLS = tools;
    if (fake) process.env.MAIL_FAKE_URL = fake;
    else delete process.env.MAIL_FAKE_URL;
    resetEnvForTests();
    const { default: MailboxPage } = await import('../../app/(bench)/dev/mailbox/page');
    // notFound() throws Next's HTTP fallback error with digest NEXT_HTTP_ERROR_FALLBACK;404.
    await expect(MailboxPage()).rejects.toMatchObject({ digest: 'NEXT_HTTP_ERROR_FALLBACK;404' });
  });

  it('goes on to the session check when both are set (control)', async () => {
    process.env.POURPROOF_DEV_TOOLS = '1';
    process.env.MAIL_FAKE_URL = 'http://127.0.0.1:3102';
    resetEnvForTests();
    const { default: MailboxPage } = await import('../../app/(bench)/dev/mailbox/page');
    // Outside a request, reading the session cookie fails: the page got past notFound().
    await expect(MailboxPage()).rejects.toThrow(/cookies|request scope/i);
  });
});
