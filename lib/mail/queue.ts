import 'server-only';
import { and, eq, inArray, lte, or } from 'drizzle-orm';
import type { DB } from '@/db/open';
import { outgoingMail } from '@/db/schema';
import { newId } from '@/lib/ids';
import { getTransport, mailFrom } from './transport';

export type MailMessage = { teamId: string | null; to: string; subject: string; text: string; html?: string };

const MAX_ATTEMPTS = 8;

// First send attempts still running; a script waits for them before it closes
// the database (settleMail).
const inFlight = new Set<Promise<unknown>>();

export async function settleMail(): Promise<void> {
  while (inFlight.size) await Promise.allSettled([...inFlight]);
}

// Every message is written to the outgoing_mail table first, then sent. A
// failed send is logged and retried with back-off; it never fails the action
// that asked for it.
export function queueMail(database: DB, msg: MailMessage): string {
  const id = newId();
  database
    .insert(outgoingMail)
    .values({ id, teamId: msg.teamId, to: msg.to, subject: msg.subject, text: msg.text, html: msg.html ?? null, nextAttemptAt: Date.now() })
    .run();
  const sending = deliverOne(database, id)
    .catch((err) => console.warn('[mail] send attempt failed', err))
    .finally(() => inFlight.delete(sending));
  inFlight.add(sending);
  return id;
}

// A claimed row is held this long; a send that has not finished by then (the
// process died mid-send) is claimed again by a later retry pass.
const SEND_LEASE_MS = 10 * 60_000;

const MESSAGE_ID_DOMAIN = '@pourproof.mail';

/** The Message-ID a queued row is sent with, so the row can be told from others later. */
export function messageIdFor(rowId: string): string {
  return `${rowId}${MESSAGE_ID_DOMAIN}`;
}


/** The outgoing row a Message-ID names, or null for a message the app did not send. */
export function rowIdOfMessageId(messageId: string | null | undefined): string | null {
  if (!messageId?.endsWith(MESSAGE_ID_DOMAIN)) return null;
  const id = messageId.slice(0, -MESSAGE_ID_DOMAIN.length);
  return /^[A-Za-z0-9_-]{1,64}$/.test(id) ? id : null;
}

// Claims a row atomically before sending it: of two passes that reach the same
// row (the first attempt and the retry timer, or two timers), exactly one sends.
function claim(database: DB, id: string, now: number): boolean {
  const res = database
    .update(outgoingMail)
    .set({ status: 'sending', nextAttemptAt: now + SEND_LEASE_MS })
    .where(and(eq(outgoingMail.id, id), or(eq(outgoingMail.status, 'queued'), and(eq(outgoingMail.status, 'sending'), lte(outgoingMail.nextAttemptAt, now)))))
    .run();
  return res.changes === 1;
}

export async function deliverOne(database: DB, id: string, now = Date.now()): Promise<boolean> {
  if (!claim(database, id, now)) return false;
  const row = database.select().from(outgoingMail).where(eq(outgoingMail.id, id)).get();
  if (!row) return false;
  try {
    await getTransport().sendMail({ from: mailFrom(), to: row.to, subject: row.subject, text: row.text, html: row.html ?? undefined, messageId: `<${messageIdFor(row.id)}>` });
    database.update(outgoingMail).set({ status: 'sent', sentAt: Date.now(), attempts: row.attempts + 1, lastError: null }).where(eq(outgoingMail.id, id)).run();
    return true;
  } catch (err) {
    const attempts = row.attempts + 1;
    const backoffMs = Math.min(5 * 60_000, 2_000 * 2 ** (attempts - 1));
    console.warn(`[mail] send failed (attempt ${attempts}): ${String(err)}`);
    database
      .update(outgoingMail)
      .set({ attempts, lastError: String(err).slice(0, 500), nextAttemptAt: Date.now() + backoffMs, status: attempts >= MAX_ATTEMPTS ? 'failed' : 'queued' })
      .where(eq(outgoingMail.id, id))
      .run();
    return false;
  }
}

export async function deliverDue(database: DB, now = Date.now()): Promise<number> {
  const due = database
    .select({ id: outgoingMail.id })
    .from(outgoingMail)
    .where(and(inArray(outgoingMail.status, ['queued', 'sending']), lte(outgoingMail.nextAttemptAt, now)))
    .limit(50)
    .all();
  let sent = 0;
  for (const { id } of due) if (await deliverOne(database, id, now)) sent++;
  return sent;
}
