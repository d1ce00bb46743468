import 'server-only';
import type { DB } from '@/db/open';
import { listRecentBatches } from '@/db/queries/batches';
import { listColorants, listMolds } from '@/db/queries/libraries';
import { listStandards } from '@/db/queries/standards';
import { toCsv } from './csv';

export const COLORANT_FIELDS = ['name', 'kind', 'unit', 'cost_per_unit', 'stock', 'low_stock_at', 'flake_size_in', 'flake_color', 'swatch_l', 'swatch_a', 'swatch_b', 'notes'];
export const MOLD_FIELDS = ['name', 'body_style', 'length_in', 'cavities', 'ml_per_cavity', 'thickness'];
const STANDARD_FIELDS = ['standard', 'standard_pour', 'tolerance_de00', 'zone', 'zone_l', 'zone_a', 'zone_b', 'colorant', 'kind', 'amount_per_cup', 'unit'];
const BATCH_FIELDS = ['batch_id', 'logged_at', 'standard', 'standard_pour', 'cups', 'zone_cups', 'mold', 'baits_expected', 'baits', 'zone', 'de00', 'band', 'zone_within_tolerance', 'tolerance_de00', 'batch_pass', 'cost', 'cost_per_bait', 'currency'];

const round = (n: number | null | undefined, d: number) => (n === null || n === undefined ? null : Number(n.toFixed(d)));

export function colorantsCsv(database: DB, teamId: string) {
  return toCsv(COLORANT_FIELDS, listColorants(database, teamId).map((c) => ({
    name: c.name, kind: c.kind, unit: c.unit, cost_per_unit: c.costPerUnit, stock: round(c.stock, 6), low_stock_at: c.lowStockAt,
    flake_size_in: c.flakeSizeIn, flake_color: c.flakeColor, swatch_l: c.swatch?.l ?? null, swatch_a: c.swatch?.a ?? null, swatch_b: c.swatch?.b ?? null, notes: c.notes,
  })));
}

export function moldsCsv(database: DB, teamId: string) {
  return toCsv(MOLD_FIELDS, listMolds(database, teamId).map((m) => ({
    name: m.name, body_style: m.bodyStyle, length_in: m.lengthIn, cavities: m.cavities, ml_per_cavity: m.mlPerCavity, thickness: m.thickness,
  })));
}

// One row per recipe line of each standard (a zone without lines: one row with no colorant).
export function standardsCsv(database: DB, teamId: string) {
  type Row = Record<string, string | number | null>;
  const rows = listStandards(database, teamId).flatMap((s) => s.zones.flatMap((z): Row[] => {
    const head = { standard: s.name, standard_pour: s.standardPourNumber, tolerance_de00: s.tolerance, zone: z.name, zone_l: round(z.lab.l, 2), zone_a: round(z.lab.a, 2), zone_b: round(z.lab.b, 2) };
    const lines = s.recipe.filter((r) => r.zone === z.name);
    if (lines.length === 0) return [{ ...head, colorant: null, kind: null, amount_per_cup: null, unit: null }];
    return lines.map((l) => ({ ...head, colorant: l.colorant, kind: l.kind, amount_per_cup: l.amount, unit: l.unit }));
  }));
  return toCsv(STANDARD_FIELDS, rows);
}

// One row per zone of each batch, newest batch first, with ΔE00 (CIEDE2000) and pass/fail.
export function batchesCsv(database: DB, teamId: string) {
  const rows = [...listRecentBatches(database, teamId, 10_000)].reverse().flatMap((b) => b.zones.map((z) => ({
    batch_id: b.id, logged_at: new Date(b.createdAt).toISOString(), standard: b.matchName, standard_pour: b.standardPourNumber, cups: round(b.cups, 4),
    zone_cups: b.zoneCups.map((c) => `${c.zone} ${round(c.cups, 4)}`).join('; '), mold: b.mold, baits_expected: b.baitsExpected, baits: b.baits,
    zone: z.name, de00: round(z.dE00, 2), band: z.band, zone_within_tolerance: z.withinTolerance ? 'yes' : 'no', tolerance_de00: b.tolerance,
    batch_pass: b.pass ? 'pass' : 'fail', cost: b.cost.complete ? round(b.cost.total, 4) : null, cost_per_bait: b.cost.complete && b.cost.perBait !== null ? round(b.cost.perBait, 4) : null, currency: b.cost.currency,
  })));
  return toCsv(BATCH_FIELDS, rows);
}
