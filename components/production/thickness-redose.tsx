import { formatDose } from '@/lib/format';
import type { Sheet } from './sheet-tables';

// The standard's recipe re-dosed for a mold of another thickness class: a prediction from the
// shop's colorant model (lib/matches/thicknessRedose.ts), per cup, beside the standard's doses.
export function ThicknessRedose({ redose }: { redose: NonNullable<Sheet['thicknessRedose']> }) {
  return (
    <section aria-labelledby="sheet-thickness" className="sheet-keep rounded-md border border-ink p-3">
      <h2 id="sheet-thickness" className="text-lg font-semibold">Re-dosed for a {redose.to} mold (a prediction)</h2>
      <p className="text-sm">{redose.note}</p>
      {redose.lines.length ? (
        <table className="mt-2 w-full text-sm">
          <thead><tr><th className="text-left">Zone</th><th className="text-left">Colorant</th><th className="text-right">Standard, per cup</th><th className="text-right">Predicted for this mold, per cup</th></tr></thead>
          <tbody>
            {redose.lines.map((l) => (
              <tr key={`${l.zone}-${l.colorantId}-${l.unit}`}>
                <td className="capitalize">{l.zone}</td>
                <td>{l.colorant}</td>
                <td className="num text-right">{formatDose(l.amount, l.unit)}</td>
                <td className="num text-right font-semibold">{formatDose(l.redosed, l.unit)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </section>
  );
}
