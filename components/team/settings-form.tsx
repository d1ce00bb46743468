'use client';

import { useActionState } from 'react';
import type { ActionState } from '@/lib/http/action';
import { Button } from '@/components/ui/button';
import { Field, inputClass } from '@/components/ui/field';
import { VOLUME_LABEL, VOLUME_UNITS } from '@/lib/recipes/units';

type Settings = { defaultTolerance: number; volumeUnit: string; dropsPerMl: number; sprueAllowanceMl: number; currency: string; stockDrawsPours: boolean; timeZone: string };

export function SettingsForm({ settings, timeZones, action }: { settings: Settings; timeZones: string[]; action: (p: ActionState, f: FormData) => Promise<ActionState> }) {
  const [state, formAction, pending] = useActionState(action, null);
  const err = state?.fieldErrors ?? {};
  return (
    <form action={formAction} className="grid gap-3 sm:grid-cols-2" aria-label="Team settings">
      <Field label="Default tolerance (ΔE00)" error={err.defaultTolerance?.[0]} hint="New matches start with it; 2.0 is usual for photo work.">
        <input name="defaultTolerance" type="number" step="0.1" defaultValue={settings.defaultTolerance} className={inputClass} />
      </Field>
      <Field label="Batch size unit" error={err.volumeUnit?.[0]}>
        <select name="volumeUnit" defaultValue={settings.volumeUnit} className={inputClass}>
          {VOLUME_UNITS.map((u) => <option key={u} value={u}>{VOLUME_LABEL[u]}</option>)}
        </select>
      </Field>
      <Field label="Drops per mL (your dropper)" error={err.dropsPerMl?.[0]} hint="About 20 is common; count the drops in 1 mL of your own dropper.">
        <input name="dropsPerMl" type="number" step="0.5" defaultValue={settings.dropsPerMl} className={inputClass} />
      </Field>
      <Field label="Sprue allowance per shot (mL)" error={err.sprueAllowanceMl?.[0]} hint="Plastisol lost to the sprue and runners each time the mold is filled.">
        <input name="sprueAllowanceMl" type="number" step="0.5" defaultValue={settings.sprueAllowanceMl} className={inputClass} />
      </Field>
      <Field label="Shop time zone" error={err.timeZone?.[0]} hint="Dates on every page and printed sheet read in it.">
        <select name="timeZone" defaultValue={settings.timeZone} className={inputClass}>
          {timeZones.map((z) => <option key={z} value={z}>{z.replaceAll('_', ' ')}</option>)}
        </select>
      </Field>
      <Field label="Currency" error={err.currency?.[0]} hint="Three-letter code (USD, EUR, CAD…); colorant and plastisol costs are in it.">
        <input name="currency" type="text" maxLength={3} autoCapitalize="characters" defaultValue={settings.currency} className={inputClass} />
      </Field>
      <label className="flex min-h-tap items-center gap-3 text-sm sm:col-span-2">
        <input name="stockDrawsPours" type="checkbox" defaultChecked={settings.stockDrawsPours} className="h-5 w-5" />
        Test pours with a batch size draw their doses and plastisol from stock too (batches always do).
      </label>
      <div className="flex items-center gap-3 sm:col-span-2">
        <Button type="submit" disabled={pending}>Save settings</Button>
        {state?.message ? <span role="status" className="text-sm text-ink-soft">{state.message}</span> : null}
      </div>
    </form>
  );
}
