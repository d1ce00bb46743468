'use client';

import type { Shape } from '@/lib/color/types';

// The reference in frame (API.md): the physical reference bait, or in production the retained
// standard, lying in the same photo. Its zones are marked as extra sampler zones named
// "<zone> (…)" and sent as each zone's `reference`.

export const referenceZone = (zone: string, what: string) => `${zone} (${what})`;

/** The zones the sampler draws: each zone, then its in-frame counterpart when asked for. */
export const samplerZones = (zones: string[], what: string | null) => (what ? [...zones, ...zones.map((z) => referenceZone(z, what))] : zones);

/** `{ name, shape, reference? }` per zone, as the pour and batch routes take them. */
export function comparedZones(zones: string[], shapes: Record<string, Shape>, what: string | null) {
  return zones.map((name) => {
    const reference = what ? shapes[referenceZone(name, what)] : undefined;
    return { name, shape: shapes[name], ...(reference ? { reference } : {}) };
  });
}

export function InFrameToggle({ checked, onChange, children }: { checked: boolean; onChange: (on: boolean) => void; children: React.ReactNode }) {
  return (
    <label className="flex min-h-tap items-center gap-2 text-sm">
      <input type="checkbox" className="h-5 w-5 shrink-0" checked={checked} onChange={(e) => onChange(e.target.checked)} />
      <span>{children}</span>
    </label>
  );
}
