import { verdictWords, withPlusMinus } from '@/components/color/verdict-words';
import { formatShare } from '@/lib/format/figures';
import type { Sheet } from './sheet-tables';

const th = 'border-b border-panel-line p-2 text-left font-semibold';
const td = 'border-b border-panel-line p-2 align-top';

// The batch's colour check per zone: ΔE00 ± against the standard (with the verdict the ± allows)
// and, when a retained standard lay in the same photo, ΔE00 ± against it.
export function SheetQc({ sheet }: { sheet: Sheet }) {
  if (sheet.qc.length === 0) return null;
  const inFrame = sheet.qc.some((z) => z.inFrame);
  const flake = sheet.qc.some((z) => (z.flake?.coverage ?? 0) > 0 || (z.standardFlake?.coverage ?? 0) > 0);
  return (
    <table className="mt-2 w-full border-collapse text-sm" aria-label="Colour check per zone">
      <thead>
        <tr>
          <th className={th}>Zone</th><th className={`${th} text-right`}>ΔE00 vs standard</th><th className={th}>Verdict</th>
          {inFrame ? <th className={`${th} text-right`}>ΔE00 vs retained standard in frame</th> : null}
          {flake ? <th className={`${th} text-right`}>Flake (standard)</th> : null}
        </tr>
      </thead>
      <tbody>
        {sheet.qc.map((z) => (
          <tr key={z.name}>
            <td className={`${td} capitalize`}>{z.name}</td>
            <td className={`${td} num text-right`}>{withPlusMinus(z.dE00, z.uncertainty)}</td>
            <td className={td}>{verdictWords(z.dE00, sheet.match.tolerance, z.uncertainty).text}</td>
            {inFrame ? <td className={`${td} num text-right`}>{z.inFrame ? withPlusMinus(z.inFrame.dE00, z.inFrame.uncertainty) : '—'}</td> : null}
            {flake ? <td className={`${td} num text-right`}>{z.flake ? formatShare(z.flake.coverage, z.flake.coverageUncertainty) : '—'}{z.standardFlake ? ` (${formatShare(z.standardFlake.coverage, z.standardFlake.coverageUncertainty)})` : ''}</td> : null}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
