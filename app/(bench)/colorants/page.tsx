import { ColorantCalibration } from '@/components/library/colorant-calibration';
import { ColorantLibrary } from '@/components/library/colorant-library';
import { db } from '@/db';
import { listColorants } from '@/db/queries/libraries';
import { requirePageMember } from '@/lib/auth/current';
import { roleAtLeast } from '@/lib/auth/roles';

export const metadata = { title: 'Colorants' };

export default async function ColorantsPage() {
  const member = await requirePageMember();
  const rows = listColorants(db(), member.team.id);
  const canEdit = roleAtLeast(member.role, 'lead');
  return (
    <section>
      <h1 className="text-2xl font-semibold">Colorants</h1>
      <p className="mt-1 text-ink-soft">
        The shop's plastisol bases, pigments, pearls, flakes, glow powders and additives; recipes pick their colorants from here.{' '}
        {canEdit
          ? 'Archiving takes a colorant off this list and out of new recipes; pours that used it keep showing it.'
          : 'Leads and the owner keep this library.'}
      </p>
      <ColorantLibrary initial={rows} canEdit={canEdit} />
      <ColorantCalibration canCalibrate={roleAtLeast(member.role, 'maker')} />
    </section>
  );
}
