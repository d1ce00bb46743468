import { converter, differenceCiede2000 } from 'culori';
import { beforeAll, describe, expect, it } from 'vitest';
import { api, expectErrorShape, signInAs, signUpShop } from '../support/http';
import { waitForMail } from '../support/mail';
import { BACK_SHAPE, BELLY_SHAPE, labToRgb8, twoTonePng, uploadPhoto } from '../support/photos';

// Independent check with culori's CIEDE2000 (kL = kC = kH = 1, ISO/CIE 11664-6:2014).
const de00 = differenceCiede2000();
const toLab = converter('lab65');
const lab65 = (rgb: [number, number, number]) => ({ ...toLab({ mode: 'rgb', r: rgb[0] / 255, g: rgb[1] / 255, b: rgb[2] / 255 }), mode: 'lab65' as const });

const TARGET = { back: labToRgb8({ l: 38, a: 10, b: 22 }), belly: labToRgb8({ l: 62, a: 12, b: 30 }) };
const STANDARD = { back: labToRgb8({ l: 39, a: 9.5, b: 21 }), belly: labToRgb8({ l: 61.5, a: 12.5, b: 30.5 }) };
const OFF = { back: labToRgb8({ l: 50, a: -10, b: -15 }), belly: labToRgb8({ l: 45, a: 30, b: 5 }) };
const ZONES = [{ name: 'back', shape: BACK_SHAPE }, { name: 'belly', shape: BELLY_SHAPE }];
// 1 cup = 231 in³ × 16.387064 mL/in³ ÷ 16 (NIST Handbook 44, Appendix C).
const ML_PER_CUP = (231 * 25.4 ** 3) / 1000 / 16;
const name = `Batch QC ${Date.now().toString(36)}`;

describe('production batches against the standard', () => {
  let maker: string;
  let lead: string;
  let viewer: string;
  let matchId: string;
  let standardId: string;
  let stickMold: { id: string; cavities: number; mlPerCavity: number };
  const ids: string[] = [];

  beforeAll(async () => {
    maker = await signInAs('maker@demo.test', 'pourproof-demo', '10.71.0.1');
    lead = await signInAs('lead@demo.test', 'pourproof-demo', '10.71.0.2');
    viewer = await signInAs('viewer@demo.test', 'pourproof-demo', '10.71.0.3');
    const colorants = (await api('/api/colorants', { cookie: maker })).body as any[];
    const pigment = colorants.find((c) => c.kind === 'pigment' && c.unit === 'drops');
    const flake = colorants.find((c) => c.kind === 'flake' && c.unit === 'tsp');
    stickMold = ((await api('/api/molds', { cookie: maker })).body as any[]).find((m) => m.cavities === 4);
    matchId = (await api('/api/matches', { cookie: maker, body: { name, zones: ['back', 'belly'] } })).body.id;
    const ref = await uploadPhoto(maker, await twoTonePng(TARGET.back, TARGET.belly), 'reference');
    expect((await api(`/api/matches/${matchId}/target`, { cookie: maker, body: { photoId: ref.id, zones: ZONES } })).status).toBe(200);
    const photo = await uploadPhoto(maker, await twoTonePng(STANDARD.back, STANDARD.belly), 'pour');
    const recipe = [
      { zone: 'back', colorantId: pigment.id, amount: 6, unit: 'drops' },
      { zone: 'back', colorantId: flake.id, amount: 0.25, unit: 'tsp' },
      { zone: 'belly', colorantId: pigment.id, amount: 2, unit: 'drops' },
    ];
    const pour = await api(`/api/matches/${matchId}/pours`, { cookie: maker, body: { photoId: photo.id, recipe, moldId: stickMold.id, tempF: 340, zones: ZONES } });
    expect(pour.status).toBe(201);
    standardId = pour.body.id;
  });

  const logBatch = async (colours: typeof STANDARD, extra: Record<string, unknown> = {}) => {
    const photo = await uploadPhoto(maker, await twoTonePng(colours.back, colours.belly), 'batch');
    return api(`/api/matches/${matchId}/batches`, { cookie: maker, body: { photoId: photo.id, zones: ZONES, cups: 3, moldId: stickMold.id, ...extra } });
  };

  it('refuses a batch before the match has a standard (409 no_standard)', async () => {
    const res = await logBatch(STANDARD);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('no_standard');
    expect((await api(`/api/pours/${standardId}/submit`, { cookie: maker, body: {} })).status).toBe(200);
    expect((await api(`/api/pours/${standardId}/sign-off`, { cookie: lead, body: { decision: 'approved' } })).status).toBe(200);
  });

  it('passes a batch of the same colours and fails one of other colours, e-mailing the leads', async () => {
    const good = await logBatch(STANDARD, { baits: 60, notes: 'morning run' });
    expect(good.status).toBe(201);
    const expected = Math.floor((3 * ML_PER_CUP) / (stickMold.cavities * stickMold.mlPerCavity)) * stickMold.cavities; // demo sprue 0 mL
    expect(good.body).toMatchObject({ matchId, standardPourId: standardId, pass: true, cups: 3, moldId: stickMold.id, baits: 60, baitsExpected: expected, notes: 'morning run' });
    expect(good.body.zones.map((z: any) => z.name)).toEqual(['back', 'belly']);
    for (const z of good.body.zones) {
      expect(z.dE00).toBeLessThanOrEqual(0.5);
      expect(z.band).toBe('indistinguishable');
      expect(z.hex).toMatch(/^#[0-9a-f]{6}$/);
      for (const k of ['dL', 'dC', 'dH']) expect(typeof z[k]).toBe('number');
    }
    ids.push(good.body.id);

    const bad = await logBatch(OFF, { baits: 0 });
    expect(bad.status).toBe(201);
    expect(bad.body.pass).toBe(false);
    for (const z of bad.body.zones) {
      const known = de00(lab65(STANDARD[z.name as 'back' | 'belly']), lab65(OFF[z.name as 'back' | 'belly']));
      expect(Math.abs(z.dE00 - known), z.name).toBeLessThanOrEqual(0.5);
      expect(z.band).toBe('off');
    }
    ids.push(bad.body.id);
    const mail = await waitForMail('lead@demo.test', new RegExp(`Batch failed QC: ${name}`));
    expect(mail.text).toMatch(/back: ΔE00 \d+\.\d\d \(off, over tolerance\)/);
    expect(mail.text).toContain(`/matches/${matchId}?batch=${bad.body.id}`);
    await waitForMail('owner@demo.test', new RegExp(`Batch failed QC: ${name}`));
  });

  it('answers bad input with 400 naming the field, and lets no viewer log', async () => {
    const photo = await uploadPhoto(maker, await twoTonePng(STANDARD.back, STANDARD.belly), 'batch');
    const body = { photoId: photo.id, zones: ZONES, cups: 3 };
    const cases: [string, RegExp][] = [
      ['{"photoId": ', /JSON/],
      [JSON.stringify({ ...body, cups: -1 }), /^cups/],
      [JSON.stringify({ ...body, cups: 401 }), /^cups/],
      [JSON.stringify({ ...body, baits: 2.5 }), /^baits/],
      [JSON.stringify({ ...body, baits: -3 }), /^baits/],
      [JSON.stringify({ ...body, zones: [{ name: 'tail', shape: BACK_SHAPE }, ZONES[1]] }), /^zones\[0\]\.name/],
      [JSON.stringify({ ...body, zones: [ZONES[0]] }), /^zones: .*belly/],
      [JSON.stringify({ ...body, moldId: 'no-such-mold' }), /^moldId/],
      [JSON.stringify({ ...body, zones: [{ name: 'back', shape: { type: 'rect', x: 0.5, y: 0, w: 0.9, h: 0.1 } }] }), /^zones\[0\]\.shape/],
    ];
    for (const [raw, field] of cases) {
      const res = await api(`/api/matches/${matchId}/batches`, { cookie: maker, raw });
      expect(res.status, raw).toBe(400);
      expectErrorShape(res.body);
      expect(res.body.error.message, raw).toMatch(field);
    }
    expect((await api(`/api/matches/${matchId}/batches`, { cookie: viewer, body })).status).toBe(403);
    expect((await api(`/api/matches/${matchId}/batches`, { cookie: maker })).body).toHaveLength(2);
  });

  it('reads batches, the batch sheet and the standards, for this team only', async () => {
    const list = await api(`/api/matches/${matchId}/batches`, { cookie: viewer });
    expect(list.status).toBe(200);
    expect(list.body.map((b: any) => b.id)).toEqual(ids);
    const one = await api(`/api/batches/${ids[1]}`, { cookie: viewer });
    expect(one.body).toEqual(list.body[1]);

    const sheet = (await api(`/api/batches/${ids[0]}/sheet`, { cookie: viewer })).body;
    expect(sheet).toMatchObject({ cups: 3, dropsPerMl: 20, sprueAllowanceMl: 0, tempF: 340, laminate: true, order: 'back over belly' });
    expect(sheet.standard).toMatchObject({ pourId: standardId, number: 1 });
    expect(sheet.batchMl).toBeCloseTo(3 * ML_PER_CUP, 6);
    const back = sheet.layout[0];
    expect(back.zone).toBe('back');
    // A laminate mixes each side in its own cup: 3 cups split evenly is 1.5 cups of each.
    expect(sheet.layout.map((l: any) => l.cups)).toEqual([1.5, 1.5]);
    expect(back.recipe.map((l: any) => [l.unit, l.total])).toEqual([['drops', 9], ['tsp', 0.375]]);
    expect(sheet.layout[1].recipe[0].total).toBeCloseTo(3, 9);
    const mold = sheet.molds[0];
    expect(mold).toMatchObject({ id: stickMold.id, selected: true, shots: Math.floor((3 * ML_PER_CUP) / 38) });
    expect(sheet.cautions.some((c: string) => c.includes('325–350 °F (homemadetackle.com, "Plastisol"'))).toBe(true);
    expect(sheet.cautions.some((c: string) => c.includes('common practice'))).toBe(true);

    const standards = (await api('/api/standards', { cookie: viewer })).body as any[];
    const std = standards.find((s) => s.matchId === matchId);
    expect(std).toMatchObject({ name, tolerance: 2, standardPourId: standardId, standardPourNumber: 1, batchCount: 2, lastBatch: { id: ids[1], pass: false } });
    expect(std.zones.map((z: any) => z.name)).toEqual(['back', 'belly']);
    expect(std.recipe[0]).toMatchObject({ zone: 'back', amount: 6, unit: 'drops' });
    expect(typeof std.recipe[0].colorant).toBe('string');

    const stranger = await signUpShop('Batch stranger');
    for (const path of [`/api/batches/${ids[0]}`, `/api/batches/${ids[0]}/sheet`, `/api/matches/${matchId}/batches`, '/api/batches/nope']) {
      const res = await api(path, { cookie: stranger.cookie });
      expect(res.status, path).toBe(404);
      expectErrorShape(res.body);
    }
    expect((await api('/api/standards', { cookie: stranger.cookie })).body).toEqual([]);
    const theirs = await api(`/api/matches/${matchId}/batches`, { cookie: stranger.cookie, body: { photoId: 'x', zones: ZONES, cups: 1 } });
    expect(theirs.status).toBe(404);
  });
});
