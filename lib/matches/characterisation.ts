import 'server-only';
import { and, eq, sql } from 'drizzle-orm';
import type { DB } from '@/db/open';
import { listColorants } from '@/db/queries/libraries';
import { swatches } from '@/db/schema';
import { MIN_OBSERVATIONS } from '@/lib/color';
import { doseKey, MODELLED_KINDS } from './doseModel';
import { shopModel } from './shopModel';

// Which colorants of the library the shop's model can dose, and how well: logged colours with
// the colorant, calibration swatches, and the model's median ΔE00 on those colours.
export async function colorantCharacterisation(database: DB, teamId: string) {
  const { model } = await shopModel(database, teamId);
  const counts = new Map(
    database
      .select({ colorantId: swatches.colorantId, n: sql<number>`count(*)` })
      .from(swatches)
      .where(and(eq(swatches.teamId, teamId)))
      .groupBy(swatches.colorantId)
      .all()
      .map((r) => [r.colorantId, r.n]),
  );
  return listColorants(database, teamId)
    .filter((c) => (MODELLED_KINDS as readonly string[]).includes(c.kind) || c.kind === 'base')
    .map((c) => {
      const fit = model?.colorants[doseKey(c.id, c.unit)];
      const observations = c.kind === 'base' ? (model?.observations ?? 0) : (fit?.observations ?? 0);
      return {
        colorantId: c.id,
        colorant: c.name,
        kind: c.kind,
        unit: c.unit,
        swatches: counts.get(c.id) ?? 0,
        observations,
        characterised: c.kind === 'base' ? model !== null : observations >= MIN_OBSERVATIONS,
        residual: c.kind === 'base' ? (model?.residual ?? null) : (fit?.residual ?? null),
      };
    });
}
