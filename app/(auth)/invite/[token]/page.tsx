import Link from 'next/link';
import { db } from '@/db';
import { AcceptInvitationForm } from '@/components/auth/accept-invitation-form';
import { findOpenInvitation } from '@/lib/team/invitations';
import { acceptInvitationAction } from './actions';

export const metadata = { title: 'Join a shop' };

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const inv = findOpenInvitation(db(), token);
  if (!inv) {
    return (
      <div>
        <h1 className="text-xl font-semibold">This invitation can't be used</h1>
        <p className="mt-2 text-ink-soft">It is unknown, already used or expired. Ask the shop owner to invite you again.</p>
        <Link href="/sign-in" className="mt-4 inline-block font-medium text-accent underline">Sign in</Link>
      </div>
    );
  }
  return (
    <div>
      <h1 className="text-xl font-semibold">Join {inv.teamName}</h1>
      <p className="mb-4 mt-1 text-ink-soft">
        Invited as <strong>{inv.role}</strong> with <span className="break-all">{inv.email}</span>.
      </p>
      <AcceptInvitationForm action={acceptInvitationAction.bind(null, token)} />
    </div>
  );
}
