import Link from 'next/link';
import { db } from '@/db';
import { pageMatches } from '@/db/queries/matches';
import { getTeamSettings } from '@/db/queries/teams';
import { MatchesFilters } from '@/components/match/matches-filters';
import { MatchesTable, parseSort, sortParam } from '@/components/match/matches-table';
import { NewMatchButton } from '@/components/match/new-match-button';
import { buttonClass } from '@/components/ui/button';
import { LeadQueue } from '@/components/match/lead-queue';
import { requirePageMember } from '@/lib/auth/current';
import { roleAtLeast } from '@/lib/auth/roles';
import { MATCH_STATUSES, type MatchStatus } from '@/lib/enums';

export const metadata = { title: 'Matches' };

const STEP = 50;
const MOST = 1000;

type Search = Promise<Record<string, string | string[] | undefined>>;
const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

// The list is rendered here, filtered in SQL and read a page at a time (newest activity first);
// "Show more" widens the page in the address, so a sort or a filter survives a reload or Back.
export default async function MatchesPage({ searchParams }: { searchParams: Search }) {
  const member = await requirePageMember();
  const settings = getTeamSettings(db(), member.team.id);
  const params = await searchParams;
  const q = (one(params.q) ?? '').trim().slice(0, 120);
  const statusParam = one(params.status) ?? '';
  const status = (MATCH_STATUSES as readonly string[]).includes(statusParam) ? (statusParam as MatchStatus) : undefined;
  const sorting = parseSort(one(params.sort));
  const asked = Math.floor(Number(one(params.shown)) || STEP);
  const shown = Math.min(MOST, Math.max(STEP, Math.ceil(asked / STEP) * STEP));
  const page = pageMatches(db(), member.team.id, { status, q: q || undefined }, { limit: shown, cursor: null });
  const filtered = Boolean(status || q);

  const href = (next: { sorting?: ReturnType<typeof parseSort>; shown?: number }) => {
    const p = new URLSearchParams();
    if (q) p.set('q', q);
    if (status) p.set('status', status);
    const sort = sortParam(next.sorting ?? sorting);
    if (sort) p.set('sort', sort);
    const n = next.shown ?? shown;
    if (n !== STEP) p.set('shown', String(n));
    const qs = p.toString();
    return qs ? `/matches?${qs}` : '/matches';
  };
  const sortedAway = sortParam(sorting) !== null;

  return (
    <section>
      <h1 className="text-2xl font-semibold">Matches</h1>
      <p className="mb-4 mt-1 text-ink-soft">Each match is one colour scheme to reproduce; every test pour is kept as a numbered iteration with its ΔE00 per zone.</p>
      {roleAtLeast(member.role, 'lead') ? <div className="mb-4"><LeadQueue /></div> : null}
      <div className="space-y-4">
        {roleAtLeast(member.role, 'maker') ? <NewMatchButton defaultTolerance={settings?.defaultTolerance ?? 2} /> : null}
        {page.items.length === 0 && !filtered ? (
          <p className="rounded-md border border-dashed border-panel-line bg-white p-4 text-ink-soft">No matches yet. Start one from a reference photo of the colour you need.</p>
        ) : (
          <div>
            <MatchesFilters q={q} status={status ?? ''} sort={sortParam(sorting)} />
            <MatchesTable data={page.items} sorting={sorting} hrefFor={(s) => href({ sorting: s })} />
            {page.next ? (
              <div className="mt-3 flex flex-wrap items-center gap-3">
                {shown < MOST ? (
                  <Link href={href({ shown: shown + STEP })} scroll={false} className={buttonClass('secondary')}>
                    Show {STEP} more
                  </Link>
                ) : null}
                <span className="text-sm text-ink-soft">
                  The {shown} with the newest activity{sortedAway ? ', sorted among themselves' : ''}; search or filter to find an older one.
                </span>
              </div>
            ) : null}
          </div>
        )}
      </div>
    </section>
  );
}
