import 'server-only';
import { getDb as db } from '@/db/client';
import { env } from '@/lib/env';
import { deliverDue } from './queue';

const g = globalThis as unknown as { pourproofMailRetry?: NodeJS.Timeout };

// Every few seconds, sends queued messages whose next attempt is due.
export function startMailRetry(everyMs = env().MAIL_RETRY_MS) {
  if (g.pourproofMailRetry) return;
  g.pourproofMailRetry = setInterval(() => {
    deliverDue(db()).catch((err) => console.warn('[mail] retry pass failed', err));
  }, everyMs);
  g.pourproofMailRetry.unref();
}
