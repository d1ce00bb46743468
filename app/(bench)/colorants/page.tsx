import { db } from '@/db';
import { listColorants } from '@/db/queries/libraries';
import { requirePageMember } from '@/lib/auth/current';

export const metadata = { title: 'Colorants' };

export default async function ColorantsPage() {
  const member = await requirePageMember();
  const rows = listColorants(db(), member.team.id);
  return (
    <section>
      <h1 className="text-2xl font-semibold">Colorants</h1>
      <p className="mt-1 text-ink-soft">The shop's plastisol bases, pigments, pearls, flakes, glow powders and additives. Editing the library comes with a later release.</p>
      <div className="mt-4 overflow-x-auto rounded-lg border border-panel-line bg-white">
        <table className="w-full text-left text-sm">
          <thead className="bg-panel-deep">
            <tr><th className="p-3">Name</th><th className="p-3">Kind</th><th className="p-3">Unit</th><th className="p-3 text-right">Flake size (in)</th><th className="p-3 text-right">Stock</th></tr>
          </thead>
          <tbody>
            {rows.map((c) => (
              <tr key={c.id} className="border-t border-panel-line">
                <td className="p-3 font-medium">{c.name}</td>
                <td className="p-3">{c.kind}</td>
                <td className="p-3">{c.unit}</td>
                <td className="p-3 text-right">{c.flakeSizeIn ?? '—'}</td>
                <td className="p-3 text-right">{c.stock === null ? '—' : `${c.stock} ${c.unit}`}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
