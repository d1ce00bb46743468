import { MatchesList } from '@/components/match/matches-list';

export const metadata = { title: 'Matches' };

export default function MatchesPage() {
  return (
    <section>
      <h1 className="text-2xl font-semibold">Matches</h1>
      <p className="mb-4 mt-1 text-ink-soft">Each match is one colour scheme to reproduce; every test pour is kept as a numbered iteration with its ΔE00 per zone.</p>
      <MatchesList />
    </section>
  );
}
