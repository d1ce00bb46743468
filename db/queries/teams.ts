import 'server-only';
import { eq } from 'drizzle-orm';
import type { DB } from '../open';
import { teams } from '../schema';

export function getTeamSettings(database: DB, teamId: string) {
  return database
    .select({ defaultTolerance: teams.defaultTolerance, volumeUnit: teams.volumeUnit, dropsPerMl: teams.dropsPerMl, sprueAllowanceMl: teams.sprueAllowanceMl, currency: teams.currency, stockDrawsPours: teams.stockDrawsPours, timeZone: teams.timeZone })
    .from(teams)
    .where(eq(teams.id, teamId))
    .get();
}
