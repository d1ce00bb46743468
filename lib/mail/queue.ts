import { and, eq, lte } from 'drizzle-orm';
import type { DB } from '@/db/open';
import { outgoingMail } from '@/db/schema';
import { newId } from '@/lib/auth/tokens';
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

export async function deliverOne(database: DB, id: string): Promise<boolean> {
  const row = database.select().from(outgoingMail).where(eq(outgoingMail.id, id)).get();
  if (!row || row.status !== 'queued') return false;
  try {
    await getTransport().sendMail({ from: mailFrom(), to: row.to, subject: row.subject, text: row.text, html: row.html ?? undefined });
    database.update(outgoingMail).set({ status: 'sent', sentAt: Date.now(), attempts: row.attempts + 1, lastError: null }).where(eq(outgoingMail.id, id)).run();
    return true;
  } catch (err) {
    const attempts = row.attempts + 1;
    const backoffMs = Math.min(5 * 60_000, 2_000 * 2 ** (attempts - 1));
    console.warn(`[mail] send to ${row.to} failed (attempt ${attempts}): ${String(err)}`);
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
    .where(and(eq(outgoingMail.status, 'queued'), lte(outgoingMail.nextAttemptAt, now)))
    .limit(50)
    .all();
  let sent = 0;
  for (const { id } of due) if (await deliverOne(database, id)) sent++;
  return sent;
}
