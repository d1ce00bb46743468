import { notFound } from 'next/navigation';
import { Suspense } from 'react';
import { db } from '@/db';
import { getMatch } from '@/db/queries/matches';
import { getTeamSettings } from '@/db/queries/teams';
import { MatchBench } from '@/components/match/match-bench';
import { requirePageMember } from '@/lib/auth/current';
import { roleAtLeast } from '@/lib/auth/roles';

export default async function MatchPage({ params }: { params: Promise<{ id: string }> }) {
  const member = await requirePageMember();
  const { id } = await params;
  const match = getMatch(db(), member.team.id, id);
  if (!match) notFound();
  const settings = getTeamSettings(db(), member.team.id);
  return (
    <Suspense fallback={<p role="status" className="text-ink-soft">Loading match…</p>}>
      <MatchBench
        matchId={match.id}
        canPour={roleAtLeast(member.role, 'maker')}
        production={{ canDecide: roleAtLeast(member.role, 'lead'), sprueAllowanceMl: settings?.sprueAllowanceMl ?? 0, volumeUnit: settings?.volumeUnit ?? 'cups' }}
      />
    </Suspense>
  );
}
