import { formatLab } from '@/lib/format';

type Lab = { l: number; a: number; b: number };
export type MeasureResult = {
  width: number;
  height: number;
  whiteBalance: { applied: boolean; method: string; neutralLab?: Lab };
  regions: { name: string; lab: Lab; hex: string; pixels: number; kept: number; spread: number; glare: number; flake: { coverage: number; groups: { lab: Lab; hex: string; share: number }[] } }[];
};

const pct = (v: number) => `${(v * 100).toFixed(1)} %`;
const lab1 = (l: Lab) => formatLab(l);

// The server's measure: the base colour (flake and glare left out) on the
// grey stage, with the figures beside it.
export function MeasureReadout({ result }: { result: MeasureResult }) {
  return (
    <div className="space-y-3" aria-label="Measured colour">
      {result.regions.map((r) => (
        <div key={r.name} className="grid gap-3 sm:grid-cols-[12rem_1fr]">
          <div className="rounded-md bg-stage p-3">
            <div className="h-24 rounded-sm border border-stage-rule" style={{ background: r.hex }} />
            {r.flake.groups.length ? (
              <div className="mt-2 flex gap-1" aria-label="Flake colours">
                {r.flake.groups.map((g, i) => <span key={i} className="h-6 flex-1 rounded-sm border border-stage-rule" style={{ background: g.hex }} title={`${pct(g.share)} of flake`} />)}
              </div>
            ) : null}
          </div>
          <dl className="num grid grid-cols-[8rem_1fr] gap-x-3 gap-y-1 text-sm">
            <dt className="text-ink-soft">Base colour</dt><dd className="font-semibold">{lab1(r.lab)} · {r.hex}</dd>
            <dt className="text-ink-soft">Pixels</dt><dd>{r.pixels.toLocaleString()} in the region, {r.kept.toLocaleString()} kept as base</dd>
            <dt className="text-ink-soft">Spread</dt><dd>{r.spread.toFixed(2)} ΔE00 (median of kept pixels)</dd>
            <dt className="text-ink-soft">Flake</dt><dd>{pct(r.flake.coverage)} of the region{r.flake.groups.length ? `, ${r.flake.groups.length} colour group${r.flake.groups.length > 1 ? 's' : ''}` : ''}</dd>
            <dt className="text-ink-soft">Glare</dt><dd>{pct(r.glare)}</dd>
            <dt className="text-ink-soft">Light</dt>
            <dd>{result.whiteBalance.applied ? `corrected from the grey card (${result.whiteBalance.method}; card read ${result.whiteBalance.neutralLab ? lab1(result.whiteBalance.neutralLab) : '—'})` : 'not corrected (no grey card marked)'}</dd>
          </dl>
        </div>
      ))}
      <p className="text-xs text-ink-soft">CIELAB with the D65 white (CIE 15:2004), from sRGB (IEC 61966-2-1). Photo {result.width} × {result.height} px.</p>
    </div>
  );
}
