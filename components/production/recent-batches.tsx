import Link from 'next/link';
import { BandBadge } from '@/components/color/band-badge';
import type { BatchView } from '@/db/queries/batches';
import { PassBadge } from './pass-badge';
import { When } from '@/components/ui/when';

const linkClass = 'inline-flex min-h-tap items-center rounded-md border border-panel-line bg-white px-3 font-medium';

// The team's recent batches across its standards, newest first: pass or fail,
// ΔE00 per zone against the standard (one decimal in a list), and the way to
// the batch on its match and to its printable sheet.
export function RecentBatches({ batches }: { batches: BatchView[] }) {
  if (batches.length === 0) {
    return (
      <p className="rounded-lg border border-panel-line bg-white p-4 text-ink-soft">
        No batches yet. Once a lead has approved a standard, log each production batch on its match page with a QC photo; it is checked here against the standard.
      </p>
    );
  }
  return (
    <ol aria-label="Recent batches" className="space-y-2">
      {batches.map((b) => (
        <li key={b.id} className="rounded-lg border border-panel-line bg-white p-3">
          <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
            <PassBadge pass={b.pass} />
            <Link href={`/matches/${b.matchId}?batch=${b.id}`} className="inline-flex min-h-tap items-center font-semibold underline decoration-panel-line underline-offset-4">
              {b.matchName}
            </Link>
            <span className="num text-sm text-ink-soft"><When at={b.createdAt} /></span>
          </div>
          <p className="num mt-1 text-sm">
            {[`standard pour #${b.standardPourNumber}`, `${b.cups} cups`, b.mold, b.baits !== null ? `${b.baits} baits` : null,
              b.baitsExpected !== null ? `${b.baitsExpected} expected` : null, b.createdBy ? `by ${b.createdBy}` : null]
              .filter(Boolean).join(' · ')}
          </p>
          <ul className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-sm" aria-label="ΔE00 per zone against the standard">
            {b.zones.map((z) => (
              <li key={z.name} className="num">
                <span className="capitalize">{z.name}</span> {z.dE00.toFixed(1)} ΔE00 <BandBadge band={z.band} className="text-xs" />
              </li>
            ))}
          </ul>
          <div className="mt-2 flex flex-wrap gap-2 text-sm">
            <Link href={`/matches/${b.matchId}?batch=${b.id}`} className={linkClass}>Open</Link>
            <Link href={`/batches/${b.id}/sheet`} className={linkClass}>Batch sheet</Link>
          </div>
        </li>
      ))}
    </ol>
  );
}
