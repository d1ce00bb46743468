import 'server-only';
import { eq, getTableColumns, getTableName, inArray, type Table } from 'drizzle-orm';
import type { SQLiteColumn } from 'drizzle-orm/sqlite-core';
import type { DB } from '../open';
import * as schema from '../schema';

// Never exported: secrets and internal storage keys.
const HIDDEN_COLUMNS = new Set(['passwordHash', 'tokenHash', 'fileKey']);
// Tables that are not the shop's data (sessions, throttling, the mail queue
// with its invitation tokens) or are exported another way (members).
const SKIPPED_TABLES = new Set(['users', 'sessions', 'sign_in_failures', 'outgoing_mail', 'memberships', 'teams']);

type Row = Record<string, unknown>;

function visible(row: Row): Row {
  return Object.fromEntries(Object.entries(row).filter(([k]) => !HIDDEN_COLUMNS.has(k)));
}

function teamTables(): { name: string; table: Table; teamId: SQLiteColumn }[] {
  const out: { name: string; table: Table; teamId: SQLiteColumn }[] = [];
  for (const value of Object.values(schema)) {
    if (!value || typeof value !== 'object' || !(Symbol.for('drizzle:IsDrizzleTable') in value)) continue;
    const table = value as Table;
    const name = getTableName(table);
    const columns = getTableColumns(table) as Record<string, SQLiteColumn>;
    if (SKIPPED_TABLES.has(name) || !columns.teamId) continue;
    out.push({ name, table, teamId: columns.teamId });
  }
  return out.sort((a, b) => a.name.localeCompare(b.name));
}

/**
 * Everything one team owns, as plain rows by table: every table that carries a
 * team id, the rows that hang under the team's matches and pours (zones, recipe
 * lines), and the members without their password hashes. Secrets and storage
 * keys are left out; photos carry the URL of their image on this API.
 */
export function exportTeam(database: DB, teamId: string, baseUrl: string) {
  const team = database.select().from(schema.teams).where(eq(schema.teams.id, teamId)).get();
  const members = database
    .select({ id: schema.users.id, email: schema.users.email, name: schema.users.name, role: schema.memberships.role, joinedAt: schema.memberships.createdAt })
    .from(schema.memberships)
    .innerJoin(schema.users, eq(schema.users.id, schema.memberships.userId))
    .where(eq(schema.memberships.teamId, teamId))
    .all();
  const tables: Record<string, Row[]> = {};
  for (const { name, table, teamId: col } of teamTables()) {
    tables[name] = (database.select().from(table as never).where(eq(col, teamId)).all() as Row[]).map(visible);
  }
  const matchIds = (tables.matches ?? []).map((m) => m.id as string);
  const pourIds = (tables.pours ?? []).map((p) => p.id as string);
  tables.zones = matchIds.length ? (database.select().from(schema.zones).where(inArray(schema.zones.matchId, matchIds)).all() as Row[]) : [];
  tables.recipe_lines = pourIds.length ? (database.select().from(schema.recipeLines).where(inArray(schema.recipeLines.pourId, pourIds)).all() as Row[]) : [];
  tables.photos = (tables.photos ?? []).map((p) => ({ ...p, imageUrl: `${baseUrl}/api/photos/${p.id as string}/image` }));
  return { format: 'pourproof-team-export', version: 1, exportedAt: new Date().toISOString(), team, members, ...tables };
}
