import { notFound } from 'next/navigation';
import { db } from '@/db';
import { getBatch } from '@/db/queries/batches';
import { BatchSheet } from '@/components/production/batch-sheet';
import { requirePageMember } from '@/lib/auth/current';
import { loadBatchSheet } from '@/lib/batches/loadBatchSheet';
import './print.css';

type Params = { params: Promise<{ id: string }> };

export async function generateMetadata({ params }: Params) {
  const member = await requirePageMember();
  const batch = getBatch(db(), member.team.id, (await params).id);
  return { title: batch ? `Batch sheet: ${batch.matchName}` : 'Batch sheet' };
}

// The printable sheet of one batch (another team's id is a 404, as a missing one is).
export default async function BatchSheetPage({ params }: Params) {
  const member = await requirePageMember();
  const { id } = await params;
  const batch = getBatch(db(), member.team.id, id);
  if (!batch) notFound();
  return <BatchSheet sheet={await loadBatchSheet(db(), member.team.id, batch)} />;
}
