import { db } from '@/db';
import { listColorants, listMolds } from '@/db/queries/libraries';
import { defaultBase } from '@/lib/batches/batchMaterials';
import { listStandards } from '@/db/queries/standards';
import { getTeamSettings } from '@/db/queries/teams';
import { RunPlanner } from '@/components/planner/run-planner';
import { requirePageMember } from '@/lib/auth/current';

export const metadata = { title: 'Run planner' };

export default async function PlanPage({ searchParams }: { searchParams: Promise<{ standard?: string }> }) {
  const member = await requirePageMember();
  const settings = getTeamSettings(db(), member.team.id)!;
  const standards = listStandards(db(), member.team.id).map((s) => ({ matchId: s.matchId, name: s.name, moldId: s.moldId, zones: s.zones.map((z) => ({ name: z.name })), recipe: s.recipe }));
  const molds = listMolds(db(), member.team.id).map((m) => ({ id: m.id, name: m.name, cavities: m.cavities, mlPerCavity: m.mlPerCavity }));
  const colorants = listColorants(db(), member.team.id).map((c) => ({ id: c.id, name: c.name, unit: c.unit, costPerUnit: c.costPerUnit, stock: c.stock }));
  return (
    <section className="space-y-4">
      <div>
        <h1 className="text-2xl font-semibold">Run planner</h1>
        <p className="mt-1 text-ink-soft">Plan a production run across the molds on the bench: the plastisol each side needs and its doses, or the baits the plastisol you have will make.</p>
      </div>
      <RunPlanner
        standards={standards}
        molds={molds}
        settings={{ volumeUnit: settings.volumeUnit, dropsPerMl: settings.dropsPerMl, sprueAllowanceMl: settings.sprueAllowanceMl, currency: settings.currency }}
        shelf={{ colorants, baseId: defaultBase(db(), member.team.id)?.id ?? null }}
        initialMatchId={(await searchParams).standard ?? null}
      />
    </section>
  );
}
