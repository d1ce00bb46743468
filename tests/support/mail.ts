import { inject } from 'vitest';

export type StoredMail = { to: string[]; subject: string; text: string; html?: string | null; at: string };

// Waits until the SMTP stand-in has a message for `to` (optionally one whose
// subject matches) and returns the newest such message.
export async function waitForMail(to: string, subject?: RegExp, timeoutMs = 15_000): Promise<StoredMail> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const res = await fetch(`${inject('mailUrl')}/messages?to=${encodeURIComponent(to)}`);
    const found = ((await res.json()) as StoredMail[]).find((m) => !subject || subject.test(m.subject));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no e-mail to ${to}${subject ? ` matching ${subject}` : ''} within ${timeoutMs} ms`);
}
