import 'server-only';
import { and, asc, eq, isNull, ne, sql } from 'drizzle-orm';
import type { DB } from '../open';
import { type Colorant, type Mold, colorants, molds } from '../schema';

type Reader = Pick<DB, 'select'>;

// The API's colorant shape (GET /api/colorants, and the answer of every write):
// the row without its team, the swatch as one Lab value or null.
export function colorantView({ swatchL, swatchA, swatchB, teamId: _t, ...c }: Colorant) {
  return { ...c, swatch: swatchL === null || swatchA === null || swatchB === null ? null : { l: swatchL, a: swatchA, b: swatchB } };
}
export type ColorantView = ReturnType<typeof colorantView>;

export function moldView({ teamId: _t, ...m }: Mold) {
  return m;
}
export type MoldView = ReturnType<typeof moldView>;

export function listColorants(database: Reader, teamId: string) {
  return database
    .select()
    .from(colorants)
    .where(and(eq(colorants.teamId, teamId), isNull(colorants.archivedAt)))
    .orderBy(asc(colorants.kind), asc(colorants.name))
    .all()
    .map(colorantView);
}

export function listMolds(database: Reader, teamId: string) {
  return database
    .select()
    .from(molds)
    .where(and(eq(molds.teamId, teamId), isNull(molds.archivedAt)))
    .orderBy(asc(molds.name))
    .all()
    .map(moldView);
}

// One library entry of the team that is still in the library (not archived).
export function getLiveColorant(database: Reader, teamId: string, id: string): Colorant | undefined {
  return database
    .select()
    .from(colorants)
    .where(and(eq(colorants.teamId, teamId), eq(colorants.id, id), isNull(colorants.archivedAt)))
    .get();
}

export function getLiveMold(database: Reader, teamId: string, id: string): Mold | undefined {
  return database
    .select()
    .from(molds)
    .where(and(eq(molds.teamId, teamId), eq(molds.id, id), isNull(molds.archivedAt)))
    .get();
}

// Another entry of the team with the same name, ignoring case (archived ones
// included: the name stays taken by the recipes that still show it).
export function findColorantByName(database: Reader, teamId: string, name: string, exceptId?: string) {
  return database
    .select({ id: colorants.id, name: colorants.name, archivedAt: colorants.archivedAt })
    .from(colorants)
    .where(and(eq(colorants.teamId, teamId), sql`lower(${colorants.name}) = lower(${name})`, exceptId ? ne(colorants.id, exceptId) : undefined))
    .get();
}

export function findMoldByName(database: Reader, teamId: string, name: string, exceptId?: string) {
  return database
    .select({ id: molds.id, name: molds.name, archivedAt: molds.archivedAt })
    .from(molds)
    .where(and(eq(molds.teamId, teamId), sql`lower(${molds.name}) = lower(${name})`, exceptId ? ne(molds.id, exceptId) : undefined))
    .get();
}
