import { db } from '@/db';
import { listMolds } from '@/db/queries/libraries';
import { requirePageMember } from '@/lib/auth/current';

export const metadata = { title: 'Molds' };

export default async function MoldsPage() {
  const member = await requirePageMember();
  const rows = listMolds(db(), member.team.id);
  return (
    <section>
      <h1 className="text-2xl font-semibold">Molds</h1>
      <p className="mt-1 text-ink-soft">Thin-bodied molds show a lighter colour for the same recipe (common practice), so the body thickness is kept with each mold.</p>
      <div className="mt-4 overflow-x-auto rounded-lg border border-panel-line bg-white">
        <table className="w-full text-left text-sm">
          <thead className="bg-panel-deep">
            <tr><th className="p-3">Name</th><th className="p-3">Body</th><th className="p-3 text-right">Length (in)</th><th className="p-3 text-right">Cavities</th><th className="p-3 text-right">Plastisol per cavity (mL)</th><th className="p-3">Thickness</th></tr>
          </thead>
          <tbody>
            {rows.map((m) => (
              <tr key={m.id} className="border-t border-panel-line">
                <td className="p-3 font-medium">{m.name}</td>
                <td className="p-3">{m.bodyStyle}</td>
                <td className="p-3 text-right">{m.lengthIn ?? '—'}</td>
                <td className="p-3 text-right">{m.cavities}</td>
                <td className="p-3 text-right">{m.mlPerCavity.toFixed(1)}</td>
                <td className="p-3">{m.thickness}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
