import 'server-only';
import type { z } from 'zod';
import type { DB } from '@/db/open';
import { findColorantByName, findMoldByName } from '@/db/queries/libraries';
import type { Member } from '@/db/queries/members';
import { colorants, molds } from '@/db/schema';
import { recordAudit } from '@/lib/audit';
import { newId } from '@/lib/ids';
import { colorantColumns } from '@/lib/libraries/colorants';
import { moldColumns } from '@/lib/libraries/molds';
import { moveStock } from '@/lib/stock/moveStock';
import { colorantSchema, moldSchema, type ColorantInput, type MoldInput } from '@/lib/validations/library';
import { parseCsv } from './csv';
import { COLORANT_FIELDS, MOLD_FIELDS } from './exportCsv';

export const MAX_IMPORT_ROWS = 1000;

export type RowError = { row: number; message: string };
export type ImportResult<T> = { rows: { row: number; value: T }[]; errors: RowError[]; written: number };

// A blank cell is "not given"; "0,5" reads as 0.5; anything else that is not a
// number goes to zod as NaN, which answers "… must be a number".
const num = (v: string | undefined) => (v === undefined || v === '' ? null : Number(/^-?\d+,\d+$/.test(v) ? v.replace(',', '.') : v));
const text = (v: string | undefined) => (v ? v : null);

function issues(error: z.ZodError) {
  return error.issues.map((i) => `${i.path.join('.') || 'row'}: ${i.message}`).join('; ');
}

// Rows are numbered as a spreadsheet shows them: the header is row 1.
function readRows<T>(csv: string, known: string[], required: string[], toValue: (r: Record<string, string>) => unknown, schema: z.ZodType<T>) {
  const parsed = parseCsv(csv);
  const errors: RowError[] = parsed.errors.map((m) => ({ row: Number(/row (\d+)/.exec(m)?.[1] ?? 1), message: m.replace(/^row \d+: /, '') }));
  const missing = required.filter((f) => !parsed.fields.includes(f));
  const unknown = parsed.fields.filter((f) => !known.includes(f));
  if (missing.length) errors.push({ row: 1, message: `the header lacks ${missing.join(', ')} (columns: ${known.join(', ')})` });
  if (unknown.length) errors.push({ row: 1, message: `unknown column${unknown.length > 1 ? 's' : ''} ${unknown.join(', ')} (columns: ${known.join(', ')})` });
  if (parsed.rows.length === 0) errors.push({ row: 2, message: 'the file has no rows under its header' });
  if (parsed.rows.length > MAX_IMPORT_ROWS) errors.push({ row: MAX_IMPORT_ROWS + 2, message: `at most ${MAX_IMPORT_ROWS} rows in one file` });
  const rows: { row: number; value: T }[] = [];
  if (missing.length || parsed.rows.length > MAX_IMPORT_ROWS) return { rows, errors };
  parsed.rows.forEach((r, i) => {
    const out = schema.safeParse(toValue(r));
    if (out.success) rows.push({ row: i + 2, value: out.data });
    else errors.push({ row: i + 2, message: issues(out.error) });
  });
  return { rows, errors };
}

// Names must be new to the library (archived entries keep theirs) and appear once in the file.
function checkNames<T extends { name: string }>(rows: { row: number; value: T }[], errors: RowError[], taken: (name: string) => boolean) {
  const seen = new Map<string, number>();
  for (const { row, value } of rows) {
    const key = value.name.toLowerCase();
    if (seen.has(key)) errors.push({ row, message: `name: "${value.name}" is already on row ${seen.get(key)}` });
    else if (taken(value.name)) errors.push({ row, message: `name: "${value.name}" is already in the library` });
    seen.set(key, row);
  }
}

const finish = <T>(rows: { row: number; value: T }[], errors: RowError[]) => ({ rows, errors: errors.sort((a, b) => a.row - b.row), written: 0 });

// Imports colorants from CSV: a preview unless `commit`, and nothing at all
// written unless every row of the file is valid. Stock enters the ledger.
export function importColorants(database: DB, member: Member, csv: string, commit: boolean): ImportResult<ColorantInput> {
  const teamId = member.team.id;
  const { rows, errors } = readRows(csv, COLORANT_FIELDS, ['name', 'kind', 'unit'], (r) => {
    const swatch = [r.swatch_l, r.swatch_a, r.swatch_b].some((v) => v) ? { l: num(r.swatch_l), a: num(r.swatch_a), b: num(r.swatch_b) } : null;
    return {
      name: r.name, kind: r.kind, unit: r.unit, costPerUnit: num(r.cost_per_unit), stock: num(r.stock), lowStockAt: num(r.low_stock_at),
      flakeSizeIn: num(r.flake_size_in), flakeColor: text(r.flake_color), swatch, notes: text(r.notes),
    };
  }, colorantSchema);
  checkNames(rows, errors, (name) => !!findColorantByName(database, teamId, name));
  const result = finish(rows, errors);
  if (!commit || result.errors.length) return result;
  database.transaction((tx) => {
    for (const { value } of rows) {
      const id = newId();
      tx.insert(colorants).values({ id, teamId, ...colorantColumns(value), stock: null }).run();
      if (value.stock !== null && value.stock !== undefined) {
        moveStock(tx, { teamId, colorantId: id, kind: 'adjustment', amount: value.stock, note: 'opening stock (CSV import)', createdBy: member.user.id });
      }
    }
    recordAudit(tx, { teamId, actorId: member.user.id, action: 'colorant.imported', entity: 'colorant', data: { count: rows.length } });
  });
  return { ...result, written: rows.length };
}

export function importMolds(database: DB, member: Member, csv: string, commit: boolean): ImportResult<MoldInput> {
  const teamId = member.team.id;
  const { rows, errors } = readRows(csv, MOLD_FIELDS, ['name', 'body_style', 'cavities', 'ml_per_cavity'], (r) => ({
    name: r.name, bodyStyle: r.body_style, lengthIn: num(r.length_in), cavities: num(r.cavities) ?? undefined, mlPerCavity: num(r.ml_per_cavity) ?? undefined,
    thickness: r.thickness || 'standard',
  }), moldSchema);
  checkNames(rows, errors, (name) => !!findMoldByName(database, teamId, name));
  const result = finish(rows, errors);
  if (!commit || result.errors.length) return result;
  database.transaction((tx) => {
    for (const { value } of rows) tx.insert(molds).values({ id: newId(), teamId, ...moldColumns(value) }).run();
    recordAudit(tx, { teamId, actorId: member.user.id, action: 'mold.imported', entity: 'mold', data: { count: rows.length } });
  });
  return { ...result, written: rows.length };
}
