import { formatLab, formatShare } from '@/lib/format';

type Lab = { l: number; a: number; b: number };
export type MeasureResult = {
  width: number;
  height: number;
  whiteBalance: { applied: boolean; method: string; neutralLab?: Lab; cast?: number; warning?: string | null };
  regions: {
    name: string; lab: Lab; hex: string; pixels: number; kept: number; spread: number; glare: number;
    flake: { coverage: number; coverageUncertainty?: number; groups: { lab: Lab; hex: string; share: number }[] };
    uncertainty?: number; shading?: number; other?: { share: number; lab: Lab } | null;
  }[];
};

const pct = (v: number) => `${(v * 100).toFixed(1)} %`;
const lab1 = (l: Lab) => formatLab(l);

// The server's measure: the base colour (flake and glare left out) on the
// grey stage, with the figures beside it.
// The API's whiteBalance.method in a maker's words.
const METHOD_WORDS: Record<string, string> = { channel: 'each colour channel scaled', bradford: 'Bradford adaptation' };

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
            <dt className="text-ink-soft">Base colour</dt><dd className="font-semibold">{lab1(r.lab)} · {r.hex}{r.uncertainty ? ` · ± ${r.uncertainty.toFixed(2)} ΔE00` : ''}</dd>
            {r.other ? <><dt className="text-band-off">Warning</dt><dd role="alert" className="font-medium text-band-off">This region reaches into another colour ({pct(r.other.share)} of it, {lab1(r.other.lab)}): it was left out; draw the region inside one colour.</dd></> : null}
            <dt className="text-ink-soft">Shading</dt><dd>{r.shading ? `light falls off by ${r.shading.toFixed(1)} L* across the region (taken out before flake is counted)` : 'evenly lit'}</dd>
            <dt className="text-ink-soft">Pixels</dt><dd>{r.pixels.toLocaleString()} in the region, {r.kept.toLocaleString()} kept as base</dd>
            <dt className="text-ink-soft">Spread</dt><dd>{r.spread.toFixed(2)} ΔE00 (median of kept pixels)</dd>
            <dt className="text-ink-soft">Flake</dt><dd>{formatShare(r.flake.coverage, r.flake.coverageUncertainty)} of the region{r.flake.groups.length ? `, ${r.flake.groups.length} colour group${r.flake.groups.length > 1 ? 's' : ''}` : ''}</dd>
            <dt className="text-ink-soft">Glare</dt><dd>{pct(r.glare)}</dd>
            <dt className="text-ink-soft">Light</dt>
            <dd>
              {result.whiteBalance.applied ? `corrected from the grey card (${METHOD_WORDS[result.whiteBalance.method] ?? result.whiteBalance.method}; card read ${result.whiteBalance.neutralLab ? lab1(result.whiteBalance.neutralLab) : '—'}${result.whiteBalance.cast !== undefined ? `, ${result.whiteBalance.cast.toFixed(1)} ΔE00 off grey` : ''})` : 'not corrected (no grey card marked)'}
              {result.whiteBalance.warning ? <span role="alert" className="block font-medium text-band-off">{result.whiteBalance.warning}</span> : null}
            </dd>
          </dl>
        </div>
      ))}
      <p className="text-xs text-ink-soft">CIELAB with the D65 white (CIE 15:2004), from the photo's own colour space. ± is about 95 % sure (JCGM 100:2008, k = 2). Photo {result.width} × {result.height} px.</p>
    </div>
  );
}
