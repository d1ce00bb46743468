import { db } from '@/db';
import { getTeamSettings } from '@/db/queries/teams';
import { MatchesList } from '@/components/match/matches-list';
import { SignOffQueue } from '@/components/match/signoff-queue';
import { requirePageMember } from '@/lib/auth/current';
import { roleAtLeast } from '@/lib/auth/roles';

export const metadata = { title: 'Matches' };

export default async function MatchesPage() {
  const member = await requirePageMember();
  const settings = getTeamSettings(db(), member.team.id);
  return (
    <section>
      <h1 className="text-2xl font-semibold">Matches</h1>
      <p className="mb-4 mt-1 text-ink-soft">Each match is one colour scheme to reproduce; every test pour is kept as a numbered iteration with its ΔE00 per zone.</p>
      {roleAtLeast(member.role, 'lead') ? <div className="mb-4"><SignOffQueue /></div> : null}
      <MatchesList canCreate={roleAtLeast(member.role, 'maker')} defaultTolerance={settings?.defaultTolerance ?? 2} />
    </section>
  );
}
