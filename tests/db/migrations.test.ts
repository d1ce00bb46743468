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

  it('keeps roles to the four at the door: the invitation and role-change schemas refuse any other', async () => {
    // SQLite does not check drizzle's text enum; every write of a role passes one of these schemas first.
    const { changeRoleSchema, invitationSchema } = await import('../../lib/validations/auth');
    for (const role of ['owner', 'lead', 'maker', 'viewer']) expect(changeRoleSchema.safeParse({ userId: 'u1', role }).success).toBe(true);
    for (const role of ['admin', 'Owner', '', 'superuser']) {
      expect(changeRoleSchema.safeParse({ userId: 'u1', role }).success, role).toBe(false);
      expect(invitationSchema.safeParse({ email: 'a@b.test', role }).success, role).toBe(false);
    }
  });
});
