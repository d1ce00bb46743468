import { and, asc, eq, isNull } from 'drizzle-orm';
import type { DB } from '../open';
import { colorants, molds } from '../schema';

export function listColorants(database: DB, teamId: string) {
  return database
    .select()
    .from(colorants)
    .where(and(eq(colorants.teamId, teamId), isNull(colorants.archivedAt)))
    .orderBy(asc(colorants.kind), asc(colorants.name))
    .all()
    .map(({ swatchL, swatchA, swatchB, teamId: _t, ...c }) => ({
      ...c,
      swatch: swatchL === null || swatchA === null || swatchB === null ? null : { l: swatchL, a: swatchA, b: swatchB },
    }));
}

export function listMolds(database: DB, teamId: string) {
  return database
    .select()
    .from(molds)
    .where(and(eq(molds.teamId, teamId), isNull(molds.archivedAt)))
    .orderBy(asc(molds.name))
    .all()
    .map(({ teamId: _t, ...m }) => m);
}
