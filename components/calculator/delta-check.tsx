'use client';

import { converter, formatHex, parse } from 'culori';
import { useState } from 'react';
import { DeltaReadout } from '@/components/color/delta-readout';
import { SwatchPair } from '@/components/color/swatch-pair';
import { Button } from '@/components/ui/button';
import { Field, TextInput } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';
import { describeDifference } from '@/lib/color/describeDifference';
import type { Band, Lab } from '@/lib/color/types';
import { apiFetch } from '@/lib/http/client';

const toLab = converter('lab65');

// "L a b" (three numbers) or a hex colour such as #7a5a3c.
export function parseColour(text: string): Lab | null {
  const nums = text.trim().split(/[\s,;]+/).map(Number);
  if (nums.length === 3 && nums.every(Number.isFinite)) return { l: nums[0]!, a: nums[1]!, b: nums[2]! };
  if (/^#?[0-9a-f]{6}$/i.test(text.trim())) {
    const c = toLab(parse(text.trim().startsWith('#') ? text.trim() : `#${text.trim()}`)!);
    return { l: c.l, a: c.a, b: c.b };
  }
  return null;
}

type Result = { dE00: number; dL: number; dC: number; dH: number; band: Band; withinTolerance: boolean };

export function DeltaCheck({ tolerance }: { tolerance: number }) {
  const [ref, setRef] = useState('');
  const [trial, setTrial] = useState('');
  const [out, setOut] = useState<{ r: Result; a: Lab; b: Lab } | null>(null);
  const [error, setError] = useState<string | null>(null);
  async function run(e: React.FormEvent) {
    e.preventDefault();
    setError(null);
    const a = parseColour(ref);
    const b = parseColour(trial);
    if (!a || !b) {
      setOut(null);
      return setError('Type each colour as three numbers (L* a* b*) or as a hex code like #7a5a3c.');
    }
    try {
      const r = await apiFetch<Result>('/api/delta-e', { method: 'POST', body: JSON.stringify({ reference: a, sample: b, tolerance }) });
      setOut({ r, a, b });
    } catch (err) {
      setOut(null);
      setError((err as Error).message);
    }
  }
  return (
    <section aria-labelledby="delta-h" className="space-y-3 rounded-lg border border-panel-line bg-white p-4">
      <h2 id="delta-h" className="text-lg font-semibold">Compare two colours</h2>
      <form onSubmit={run} className="grid gap-3 sm:grid-cols-[1fr_1fr_auto] sm:items-end" aria-label="Compare two colours">
        <Field label="Target (L* a* b*, or hex)"><TextInput value={ref} onChange={(e) => { setRef(e.target.value); setOut(null); }} placeholder="38.2 9.5 22.4" /></Field>
        <Field label="Trial (L* a* b*, or hex)"><TextInput value={trial} onChange={(e) => { setTrial(e.target.value); setOut(null); }} placeholder="#6b4f3a" /></Field>
        <Button type="submit">Compare</Button>
      </form>
      <FormError message={error} />
      {out ? (
        <div className="grid gap-3 sm:grid-cols-2" aria-label="Difference">
          <SwatchPair left={formatHex({ mode: 'lab65', ...out.a })} right={formatHex({ mode: 'lab65', ...out.b })} leftLabel="target" rightLabel="trial" />
          <div className="space-y-1 text-sm">
            <DeltaReadout d={out.r} direction={describeDifference(out.a, out.b).text} />
            <p className="text-ink-soft">{out.r.withinTolerance ? `Within the shop's tolerance of ${tolerance.toFixed(1)} ΔE00.` : `Outside the shop's tolerance of ${tolerance.toFixed(1)} ΔE00.`}</p>
          </div>
        </div>
      ) : null}
      <p className="text-xs text-ink-soft">CIEDE2000 with kL = kC = kH = 1 (ISO/CIE 11664-6), computed on the server. Bands: ≤ 1.0 indistinguishable, ≤ 2.0 close, ≤ 3.5 noticeable, above that off — rules of thumb for photo work, not a standard.</p>
    </section>
  );
}
