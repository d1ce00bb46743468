import { notFound } from 'next/navigation';
import { db } from '@/db';
import { getMatch } from '@/db/queries/matches';
import { requirePageMember } from '@/lib/auth/current';

// Checked here, above the segment's loading boundary, so a missing match (or
// another team's) answers HTTP 404 before anything streams.
export default async function MatchLayout({ children, params }: { children: React.ReactNode; params: Promise<{ id: string }> }) {
  const member = await requirePageMember();
  if (!getMatch(db(), member.team.id, (await params).id)) notFound();
  return children;
}
