import { MoldLibrary } from '@/components/library/mold-library';
import { db } from '@/db';
import { listMolds } from '@/db/queries/libraries';
import { requirePageMember } from '@/lib/auth/current';
import { roleAtLeast } from '@/lib/auth/roles';

export const metadata = { title: 'Molds' };

export default async function MoldsPage() {
  const member = await requirePageMember();
  const rows = listMolds(db(), member.team.id);
  const canEdit = roleAtLeast(member.role, 'lead');
  return (
    <section>
      <h1 className="text-2xl font-semibold">Molds</h1>
      <p className="mt-1 text-ink-soft">Thin-bodied molds show a lighter colour for the same recipe (common practice), so the body thickness is kept with each mold.</p>
      {canEdit ? <p className="mt-1 text-ink-soft">Archiving takes a mold off this list; pours and batches that used it keep showing it.</p> : null}
      <MoldLibrary initial={rows} canEdit={canEdit} />
    </section>
  );
}
