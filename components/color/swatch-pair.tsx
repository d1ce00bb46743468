import type { ReactNode } from 'react';

type Surround = 'grey' | 'white' | 'black';
const SURROUND: Record<Surround, string> = { grey: 'bg-stage', white: 'bg-white', black: 'bg-black' };

// Target and trial side by side on a neutral surround, each with a thin light
// rule; nothing saturated within sight.
export function SwatchPair({ left, right, leftLabel, rightLabel, surround = 'grey' }: { left: string; right: string; leftLabel: ReactNode; rightLabel: ReactNode; surround?: Surround }) {
  return (
    <div className={`flex gap-3 rounded-md p-4 ${SURROUND[surround]}`}>
      {[
        [left, leftLabel],
        [right, rightLabel],
      ].map(([hex, label], i) => (
        <figure key={i} className="flex-1">
          <div className="h-24 rounded-sm border border-stage-rule" style={{ background: hex as string }} />
          <figcaption className={`mt-1 text-xs ${surround === 'white' ? 'text-ink' : 'text-white'}`}>{label}</figcaption>
        </figure>
      ))}
    </div>
  );
}

export function SurroundToggle({ value, onChange }: { value: Surround; onChange: (s: Surround) => void }) {
  return (
    <div role="group" aria-label="Swatch surround" className="flex gap-1 text-sm">
      {(['grey', 'white', 'black'] as const).map((s) => (
        <button key={s} type="button" aria-pressed={value === s} onClick={() => onChange(s)} className={`min-h-tap rounded-md border px-3 ${value === s ? 'border-ink bg-white font-semibold' : 'border-panel-line bg-panel'}`}>
          on {s}
        </button>
      ))}
    </div>
  );
}

export type { Surround };
