import Link from 'next/link';
import { db } from '@/db';
import { pageRecentBatches } from '@/db/queries/batches';
import { RecentBatches } from '@/components/production/recent-batches';
import { LogBatchPicker } from '@/components/production/log-batch-picker';
import { listStandards } from '@/db/queries/standards';
import { requirePageMember } from '@/lib/auth/current';
import { CsvDownload } from '@/components/library/csv-tools';
import { roleAtLeast } from '@/lib/auth/roles';
import { cursorOrNull, encodeCursor } from '@/lib/http/paging';

export const metadata = { title: 'Batches' };

const PAGE = 50;

// A page of batches at a time: "Older batches" carries the cursor in the address.
export default async function BatchesPage({ searchParams }: { searchParams: Promise<{ before?: string | string[] }> }) {
  const member = await requirePageMember();
  const cursor = cursorOrNull((await searchParams).before);
  const { items: batches, next } = pageRecentBatches(db(), member.team.id, { limit: PAGE, cursor });
  return (
    <section className="space-y-4">
      <div>
        <h1 className="text-2xl font-semibold">Batches</h1>
        <p className="mt-1 text-ink-soft">
          Production batches of the shop’s <Link href="/standards" className="underline underline-offset-4">standards</Link>, newest first: each is measured from its QC
          photo and passes when every zone is within the match’s tolerance (ΔE00, CIEDE2000). Bands are rules of thumb for photo work, not a standard.
        </p>
        <div className="mt-2"><CsvDownload what="batches" label="Download batches with ΔE00 (CSV)" /></div>
      </div>
      {roleAtLeast(member.role, 'maker') ? <LogBatchPicker standards={listStandards(db(), member.team.id).map((s) => ({ matchId: s.matchId, name: s.name }))} /> : null}
      <RecentBatches batches={batches} />
      {cursor || next ? (
        <nav aria-label="More batches" className="flex flex-wrap gap-3">
          {cursor ? <Link href="/batches" className="inline-flex min-h-tap items-center rounded-md border border-panel-line bg-white px-4 font-medium">Newest batches</Link> : null}
          {next ? <Link href={`/batches?before=${encodeURIComponent(encodeCursor(next))}`} className="inline-flex min-h-tap items-center rounded-md border border-panel-line bg-white px-4 font-medium">Older batches</Link> : null}
        </nav>
      ) : null}
    </section>
  );
}
