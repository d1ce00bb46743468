import { notFound } from 'next/navigation';
import { db } from '@/db';
import { getBatch } from '@/db/queries/batches';
import { requirePageMember } from '@/lib/auth/current';

// Checked here, above the segment's loading boundary, so a missing batch (or
// another team's) answers HTTP 404 before anything streams.
export default async function BatchSheetLayout({ children, params }: { children: React.ReactNode; params: Promise<{ id: string }> }) {
  const member = await requirePageMember();
  if (!getBatch(db(), member.team.id, (await params).id)) notFound();
  return children;
}
