import Database from 'better-sqlite3';
import { describe, expect, inject, it } from 'vitest';
import { api, signInAs, signUpShop } from '../support/http';

// Pages of a record that is missing, or another shop's, answer a real HTTP 404
// (checked before anything streams), exactly alike.
describe('record pages that are not yours', () => {
  it('answer 404 for a missing or foreign match and batch sheet', async () => {
    const raw = new Database(inject('dbFile'), { readonly: true });
    const team = (raw.prepare("select m.team_id as t from memberships m join users u on u.id = m.user_id where u.email = 'maker@demo.test'").get() as { t: string }).t;
    const demoMatch = (raw.prepare('select id from matches where team_id = ? limit 1').get(team) as { id: string }).id;
    const demoBatch = (raw.prepare('select id from batches where team_id = ? limit 1').get(team) as { id: string }).id;
    raw.close();
    const stranger = await signUpShop('Stranger shop');
    const demoMaker = await signInAs('maker@demo.test', 'pourproof-demo', '10.65.0.1');

    for (const path of [`/matches/${demoMatch}`, '/matches/no-such-match', `/batches/${demoBatch}/sheet`, '/batches/no-such-batch/sheet']) {
      const res = await api(path, { cookie: stranger.cookie });
      expect(res.status, path).toBe(404);
    }
    // Control: the demo shop's own member sees them.
    expect((await api(`/matches/${demoMatch}`, { cookie: demoMaker })).status).toBe(200);
    expect((await api(`/batches/${demoBatch}/sheet`, { cookie: demoMaker })).status).toBe(200);
  });
});
