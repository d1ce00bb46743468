import { db } from '@/db';
import { listMolds } from '@/db/queries/libraries';
import { listStandards } from '@/db/queries/standards';
import { getTeamSettings } from '@/db/queries/teams';
import { standardCost } from '@/lib/batches/batchMaterials';
import { StandardsList } from '@/components/production/standards-list';
import { requirePageMember } from '@/lib/auth/current';
import { CsvDownload } from '@/components/library/csv-tools';
import { roleAtLeast } from '@/lib/auth/roles';

export const metadata = { title: 'Standards' };

export default async function StandardsPage() {
  const member = await requirePageMember();
  const teamId = member.team.id;
  const settings = getTeamSettings(db(), teamId)!;
  const molds = listMolds(db(), teamId);
  const standards = listStandards(db(), teamId).map((s) => ({
    ...s,
    cost: {
      currency: settings.currency,
      ...standardCost(db(), teamId, {
        standardPourId: s.standardPourId, zones: s.zones.map((z) => z.name), mold: molds.find((m) => m.id === s.moldId) ?? null,
        dropsPerMl: settings.dropsPerMl, sprueAllowanceMl: settings.sprueAllowanceMl,
      }),
    },
  }));
  return (
    <section className="space-y-4">
      <div>
        <h1 className="text-2xl font-semibold">Standards</h1>
        <p className="mt-1 text-ink-soft">
          The shop’s approved colours: the recipe a lead signed off, and how its production batches have gone. Colours in CIELAB (D65 white,
          measured from sRGB), as sampled on the standard pour’s photo; flake and glare left out.
        </p>
        <div className="mt-2"><CsvDownload what="standards" label="Download standards and recipes (CSV)" /></div>
      </div>
      <StandardsList standards={standards} canLog={roleAtLeast(member.role, 'maker')} />
    </section>
  );
}
