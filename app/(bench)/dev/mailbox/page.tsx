import { notFound } from 'next/navigation';
import { requirePageMember } from '@/lib/auth/current';
import { env } from '@/lib/env';
import { MailboxList } from './mailbox-list';

export const metadata = { title: 'Mailbox (development)' };
export const dynamic = 'force-dynamic';

// Development only: what the local SMTP stand-in received. Absent (404) unless
// dev tools are on and the app sends to the stand-in.
export default async function MailboxPage() {
  const { POURPROOF_DEV_TOOLS, MAIL_FAKE_URL } = env();
  if (POURPROOF_DEV_TOOLS !== '1' || !MAIL_FAKE_URL) notFound();
  await requirePageMember('owner');
  return (
    <section>
      <h1 className="text-2xl font-semibold">Mailbox</h1>
      <p className="mb-4 mt-1 text-ink-soft">
        Development only: every e-mail the app sent for your shop to the local mail stand-in (invitations and notices to your members), newest first. Nothing here left this machine.
      </p>
      <MailboxList />
    </section>
  );
}
