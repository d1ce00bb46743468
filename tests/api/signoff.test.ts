import { eq } from 'drizzle-orm';
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { openDatabase } from '../../db/open';
import { matches, pours } from '../../db/schema';
import { api, expectErrorShape, signInAs, signUpShop } from '../support/http';
import { waitForMail } from '../support/mail';
import { BACK_SHAPE, BELLY_SHAPE, labToRgb8, twoTonePng, uploadPhoto } from '../support/photos';

const TARGET = { back: labToRgb8({ l: 38, a: 10, b: 22 }), belly: labToRgb8({ l: 62, a: 12, b: 30 }) };
const NEAR = { back: labToRgb8({ l: 39, a: 9.5, b: 21 }), belly: labToRgb8({ l: 61.5, a: 12.5, b: 30.5 }) };
const ZONES = [{ name: 'back', shape: BACK_SHAPE }, { name: 'belly', shape: BELLY_SHAPE }];
const uniq = () => `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
const esc = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

async function matchWithTarget(cookie: string, name: string) {
  const created = await api('/api/matches', { cookie, body: { name, zones: ['back', 'belly'] } });
  expect(created.status).toBe(201);
  const ref = await uploadPhoto(cookie, await twoTonePng(TARGET.back, TARGET.belly), 'reference');
  expect((await api(`/api/matches/${created.body.id}/target`, { cookie, body: { photoId: ref.id, zones: ZONES } })).status).toBe(200);
  return created.body.id as string;
}

let pigmentId = '';
async function pour(cookie: string, matchId: string, recipe = [{ zone: 'back', colorantId: pigmentId, amount: 4, unit: 'drops' }]) {
  const photo = await uploadPhoto(cookie, await twoTonePng(NEAR.back, NEAR.belly), 'pour');
  const res = await api(`/api/matches/${matchId}/pours`, { cookie, body: { photoId: photo.id, recipe, tempF: 340, zones: ZONES } });
  expect(res.status).toBe(201);
  return res.body as { id: string; number: number };
}

describe('sign-off: submit, approve, rework, standards', () => {
  let maker: string;
  let lead: string;
  let owner: string;
  let viewer: string;
  beforeAll(async () => {
    maker = await signInAs('maker@demo.test', 'pourproof-demo', '10.70.0.1');
    lead = await signInAs('lead@demo.test', 'pourproof-demo', '10.70.0.2');
    owner = await signInAs('owner@demo.test', 'pourproof-demo', '10.70.0.3');
    viewer = await signInAs('viewer@demo.test', 'pourproof-demo', '10.70.0.4');
    const colorants = (await api('/api/colorants', { cookie: maker })).body as any[];
    pigmentId = colorants.find((c) => c.kind === 'pigment' && c.unit === 'drops').id;
  });

  it('refuses to submit or approve a pour without recipe lines (409), and changes nothing', async () => {
    const matchId = await matchWithTarget(maker, `No recipe ${uniq()}`);
    const empty = await pour(maker, matchId, []);
    const sub = await api(`/api/pours/${empty.id}/submit`, { cookie: maker, body: {} });
    expect(sub.status).toBe(409);
    expectErrorShape(sub.body);
    expect(sub.body.error.code).toBe('no_recipe');
    expect(sub.body.error.message).toMatch(/^Pour #1 has no recipe lines, so it cannot be submitted/);
    expect((await api(`/api/pours/${empty.id}`, { cookie: maker })).body.status).toBe('measured');
    expect((await api(`/api/matches/${matchId}`, { cookie: maker })).body.status).toBe('open');

    // A recipe-less pour already waiting (from before this check) cannot be approved; rework still can.
    const database = openDatabase(inject('dbFile'));
    try {
      database.update(pours).set({ status: 'submitted' }).where(eq(pours.id, empty.id)).run();
    } finally {
      database.$client.close();
    }
    const approve = await api(`/api/pours/${empty.id}/sign-off`, { cookie: lead, body: { decision: 'approved' } });
    expect(approve.status).toBe(409);
    expect(approve.body.error.code).toBe('no_recipe');
    expect(approve.body.error.message).toMatch(/cannot be approved/);
    expect((await api(`/api/matches/${matchId}`, { cookie: maker })).body.standardPourId).toBeNull();
    const back = await api(`/api/pours/${empty.id}/sign-off`, { cookie: lead, body: { decision: 'rework', comment: 'log the doses' } });
    expect(back.status).toBe(200);
  });

  it('submits, e-mails the leads, lets only leads decide, and retires a replaced standard', async () => {
    const name = `Signoff path ${uniq()}`;
    const matchId = await matchWithTarget(maker, name);
    const p1 = await pour(maker, matchId);
    const other = await pour(maker, matchId);

    const sub = await api(`/api/pours/${p1.id}/submit`, { cookie: maker, body: { note: 'back looks right under the bench lamp' } });
    expect(sub.status).toBe(200);
    expect(sub.body).toMatchObject({ id: p1.id, matchId, number: 1, status: 'submitted' });
    expect(typeof sub.body.submittedAt).toBe('number');
    expect((await api(`/api/matches/${matchId}`, { cookie: maker })).body.status).toBe('in_review');

    // One pour in review at a time; a submitted pour is not submitted twice.
    const second = await api(`/api/pours/${other.id}/submit`, { cookie: maker, body: {} });
    expect(second.status).toBe(409);
    expectErrorShape(second.body);
    expect((await api(`/api/pours/${p1.id}/submit`, { cookie: maker, raw: '' })).status).toBe(409);

    for (const to of ['lead@demo.test', 'owner@demo.test']) {
      const mail = await waitForMail(to, new RegExp(`Sign-off requested: ${esc(name)}, pour #1`));
      expect(mail.text).toMatch(/back: ΔE00 \d+\.\d\d \((indistinguishable|close|noticeable|off)/);
      expect(mail.text).toMatch(/belly: ΔE00 \d+\.\d\d \(/);
      expect(mail.text).toContain(`/matches/${matchId}?pour=${p1.id}`);
      expect(mail.text).toContain('bench lamp');
      expect(mail.html).toContain('pour #1');
    }

    // Makers and viewers may not decide; nothing changes.
    for (const cookie of [maker, viewer]) {
      const res = await api(`/api/pours/${p1.id}/sign-off`, { cookie, body: { decision: 'approved' } });
      expect(res.status).toBe(403);
      expectErrorShape(res.body);
    }
    expect((await api(`/api/pours/${p1.id}`, { cookie: maker })).body.status).toBe('submitted');

    const ok = await api(`/api/pours/${p1.id}/sign-off`, { cookie: lead, body: { decision: 'approved', comment: 'Good to go' } });
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ id: p1.id, status: 'approved' });
    let match = (await api(`/api/matches/${matchId}`, { cookie: maker })).body;
    expect(match).toMatchObject({ status: 'approved', standardPourId: p1.id });
    const approved = await waitForMail('maker@demo.test', new RegExp(`Approved: ${esc(name)}, pour #1`));
    expect(approved.text).toContain('Good to go');
    expect(approved.text).toContain(`/matches/${matchId}?pour=${p1.id}`);
    expect((await api(`/api/pours/${p1.id}/sign-off`, { cookie: lead, body: { decision: 'approved' } })).status).toBe(409);
    expect((await api(`/api/pours/${p1.id}/submit`, { cookie: maker, body: {} })).status).toBe(409);

    // A lead pours, submits and approves a better one: the record shows who did
    // what, and the first standard is retired, not deleted.
    const p3 = await pour(lead, matchId);
    expect((await api(`/api/pours/${p3.id}/submit`, { cookie: lead, body: {} })).status).toBe(200);
    expect((await api(`/api/matches/${matchId}`, { cookie: maker })).body.status).toBe('in_review');
    const again = await api(`/api/pours/${p3.id}/sign-off`, { cookie: lead, body: { decision: 'approved' } });
    expect(again.status).toBe(200);
    match = (await api(`/api/matches/${matchId}`, { cookie: maker })).body;
    expect(match).toMatchObject({ status: 'approved', standardPourId: p3.id });
    const first = (await api(`/api/pours/${p1.id}`, { cookie: maker })).body;
    expect(first.status).toBe('retired');
    expect(first.zones).toHaveLength(2);

    const history = await api(`/api/matches/${matchId}/history`, { cookie: viewer });
    expect(history.status).toBe(200);
    const rows = history.body as any[];
    expect(rows.map((r) => [r.kind, r.pourNumber])).toEqual([['approved', 3], ['submitted', 3], ['approved', 1], ['submitted', 1]]);
    expect(rows[0]).toMatchObject({ by: { name: 'Lem Tashgar' }, retiredPourId: p1.id, comment: null });
    expect(rows[1].by.name).toBe('Lem Tashgar');
    expect(rows[2]).toMatchObject({ by: { name: 'Lem Tashgar' }, comment: 'Good to go', retiredPourId: null });
    expect(rows[3]).toMatchObject({ by: { name: 'Mika Feldspar' }, comment: 'back looks right under the bench lamp' });
    for (let i = 1; i < rows.length; i++) expect(rows[i - 1].at).toBeGreaterThanOrEqual(rows[i].at);
    // The owner decides as a lead does.
    const p4 = await pour(maker, matchId);
    expect((await api(`/api/pours/${p4.id}/submit`, { cookie: maker, body: {} })).status).toBe(200);
    expect((await api(`/api/pours/${p4.id}/sign-off`, { cookie: owner, body: { decision: 'rework', comment: 'belly too pale' } })).status).toBe(200);
    // A rework on a match with a standard leaves that standard in force.
    expect((await api(`/api/matches/${matchId}`, { cookie: maker })).body).toMatchObject({ status: 'approved', standardPourId: p3.id });
  });

  it('needs a comment to send a pour back, reopens the match and tells the maker', async () => {
    const name = `Rework path ${uniq()}`;
    const matchId = await matchWithTarget(maker, name);
    const p = await pour(maker, matchId);
    expect((await api(`/api/pours/${p.id}/sign-off`, { cookie: lead, body: { decision: 'rework', comment: 'x' } })).status).toBe(409);
    expect((await api(`/api/pours/${p.id}/submit`, { cookie: maker, body: {} })).status).toBe(200);

    const bad: [string, number, RegExp][] = [
      [JSON.stringify({ decision: 'rework' }), 400, /^comment: say what to change$/],
      [JSON.stringify({ decision: 'rework', comment: '   ' }), 400, /^comment: say what to change$/],
      [JSON.stringify({ decision: 'maybe' }), 400, /^decision/],
      [JSON.stringify({ decision: 'approved', comment: 'x'.repeat(2001) }), 400, /^comment/],
      ['{"decision": ', 400, /JSON/],
      ['[]', 400, /.+/],
    ];
    for (const [raw, status, message] of bad) {
      const res = await api(`/api/pours/${p.id}/sign-off`, { cookie: lead, raw });
      expect(res.status, raw).toBe(status);
      expectErrorShape(res.body);
      expect(res.body.error.message, raw).toMatch(message);
    }
    expect((await api(`/api/pours/${p.id}/submit`, { cookie: maker, body: { note: 5 } })).status).toBe(400);
    expect((await api(`/api/pours/${p.id}`, { cookie: maker })).body.status).toBe('submitted');

    const res = await api(`/api/pours/${p.id}/sign-off`, { cookie: lead, body: { decision: 'rework', comment: 'Back needs 2 more drops of marsh brown' } });
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('rework');
    expect((await api(`/api/matches/${matchId}`, { cookie: maker })).body).toMatchObject({ status: 'open', standardPourId: null });
    const mail = await waitForMail('maker@demo.test', new RegExp(`Rework: ${esc(name)}, pour #1`));
    expect(mail.text).toContain('Back needs 2 more drops of marsh brown');
    expect(mail.text).toContain(`/matches/${matchId}?pour=${p.id}`);
    const history = (await api(`/api/matches/${matchId}/history`, { cookie: maker })).body;
    expect(history[0]).toMatchObject({ kind: 'rework', comment: 'Back needs 2 more drops of marsh brown', by: { name: 'Lem Tashgar' } });

    // A pour sent back may go for sign-off again.
    expect((await api(`/api/pours/${p.id}/submit`, { cookie: maker, body: { note: 'dosed as asked' } })).status).toBe(200);
    expect((await api(`/api/matches/${matchId}`, { cookie: maker })).body.status).toBe('in_review');

    // An archived match takes no submits, decisions or batches; nothing changes.
    const database = openDatabase(inject('dbFile'));
    try {
      database.update(matches).set({ status: 'archived' }).where(eq(matches.id, matchId)).run();
      const decided = await api(`/api/pours/${p.id}/sign-off`, { cookie: lead, body: { decision: 'approved' } });
      expect(decided.status).toBe(409);
      expect(decided.body.error.code).toBe('archived');
      expect((await api(`/api/pours/${p.id}`, { cookie: maker })).body.status).toBe('submitted');
      const batch = await api(`/api/matches/${matchId}/batches`, { cookie: maker, body: { photoId: 'x', zones: ZONES, cups: 1 } });
      expect(batch.status).toBe(409);
      database.update(pours).set({ status: 'rework' }).where(eq(pours.id, p.id)).run();
      expect((await api(`/api/pours/${p.id}/submit`, { cookie: maker, body: {} })).status).toBe(409);
    } finally {
      database.$client.close();
    }

    // A viewer cannot submit; another shop sees nothing of it.
    expect((await api(`/api/pours/${p.id}/submit`, { cookie: viewer, body: {} })).status).toBe(403);
    const stranger = await signUpShop('Signoff stranger');
    for (const path of [`/api/pours/${p.id}/submit`, `/api/pours/${p.id}/sign-off`]) {
      const r = await api(path, { cookie: stranger.cookie, body: { decision: 'approved' } });
      expect(r.status, path).toBe(404);
      expectErrorShape(r.body);
    }
    expect((await api(`/api/matches/${matchId}/history`, { cookie: stranger.cookie })).status).toBe(404);
    expect((await api('/api/pours/no-such-pour/submit', { cookie: maker, body: {} })).status).toBe(404);
  });

  it('lets a lead archive a match with its standard and reopen it; makers may not', async () => {
    const matchId = await matchWithTarget(maker, `Archive ${uniq()}`);
    const p1 = await pour(maker, matchId);
    expect((await api(`/api/pours/${p1.id}/submit`, { cookie: maker, body: {} })).status).toBe(200);
    const early = await api(`/api/matches/${matchId}/archive`, { cookie: lead, method: 'POST' });
    expect(early.status).toBe(409);
    expect(early.body.error.message).toMatch(/sign-off/);
    expect((await api(`/api/pours/${p1.id}/sign-off`, { cookie: lead, body: { decision: 'approved' } })).status).toBe(200);
    for (const who of [maker, viewer]) expect((await api(`/api/matches/${matchId}/archive`, { cookie: who, method: 'POST' })).status).toBe(403);
    const archived = await api(`/api/matches/${matchId}/archive`, { cookie: lead, method: 'POST' });
    expect(archived.status).toBe(200);
    expect(archived.body.status).toBe('archived');
    expect(archived.body.standardPourId).toBe(p1.id);
    const photo = await uploadPhoto(maker, await twoTonePng(NEAR.back, NEAR.belly), 'batch');
    expect((await api(`/api/matches/${matchId}/batches`, { cookie: maker, body: { photoId: photo.id, zones: ZONES, cups: 1 } })).status).toBe(409);
    expect((await api(`/api/matches/${matchId}/pours`, { cookie: maker, body: { photoId: photo.id, recipe: [], zones: ZONES } })).status).toBe(409);
    expect((await api('/api/standards', { cookie: maker })).body.some((s: { matchId: string }) => s.matchId === matchId)).toBe(false);
    const reopened = await api(`/api/matches/${matchId}/reopen`, { cookie: owner, method: 'POST' });
    expect(reopened.status).toBe(200);
    expect(reopened.body.status).toBe('approved');
    expect((await api(`/api/matches/${matchId}/reopen`, { cookie: owner, method: 'POST' })).status).toBe(409);
    const stranger = await signUpShop('Archive stranger');
    expect((await api(`/api/matches/${matchId}/archive`, { cookie: stranger.cookie, method: 'POST' })).status).toBe(404);
  });
});
