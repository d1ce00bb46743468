import { db } from '@/db';
import { listStandards } from '@/db/queries/standards';
import { StandardsList } from '@/components/production/standards-list';
import { requirePageMember } from '@/lib/auth/current';
import { roleAtLeast } from '@/lib/auth/roles';

export const metadata = { title: 'Standards' };

export default async function StandardsPage() {
  const member = await requirePageMember();
  const standards = listStandards(db(), member.team.id);
  return (
    <section className="space-y-4">
      <div>
        <h1 className="text-2xl font-semibold">Standards</h1>
        <p className="mt-1 text-ink-soft">
          The shop’s approved colours: the recipe a lead signed off, and how its production batches have gone. Colours in CIELAB (D65 white,
          measured from sRGB), as sampled on the standard pour’s photo; flake and glare left out.
        </p>
      </div>
      <StandardsList standards={standards} canLog={roleAtLeast(member.role, 'maker')} />
    </section>
  );
}
