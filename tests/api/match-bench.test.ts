import { differenceCiede2000 } from 'culori';
import { beforeAll, describe, expect, it } from 'vitest';
import { api, expectErrorShape, signInAs, signUpShop } from '../support/http';
import { BACK_SHAPE, BELLY_SHAPE, labToRgb8, twoTonePng, uploadPhoto } from '../support/photos';

// Independent check: culori's own CIEDE2000 between the known colours
// (kL = kC = kH = 1, ISO/CIE 11664-6:2014), on culori's lab65 values.
const de00 = differenceCiede2000();
const lab65 = (l: number, a: number, b: number) => ({ mode: 'lab65' as const, l, a, b });

// The known colours are chosen inside the sRGB gamut and then rounded to 8-bit
// sRGB by the photo, so "known" means the Lab of the rounded sRGB value.
import { converter } from 'culori';
const toLab = converter('lab65');
const labOf = (rgb: [number, number, number]) => {
  const c = toLab({ mode: 'rgb', r: rgb[0] / 255, g: rgb[1] / 255, b: rgb[2] / 255 });
  return { l: c.l, a: c.a, b: c.b };
};

const TARGET = { back: labToRgb8({ l: 38, a: 10, b: 22 }), belly: labToRgb8({ l: 62, a: 12, b: 30 }) };
const POUR1 = { back: labToRgb8({ l: 42, a: 8, b: 18 }), belly: labToRgb8({ l: 60, a: 15, b: 33 }) };
const POUR2 = { back: labToRgb8({ l: 39, a: 9.5, b: 21 }), belly: labToRgb8({ l: 61.5, a: 12.5, b: 30.5 }) };

describe('match bench API: target, numbered pours, ΔE00 per zone', () => {
  let maker: string;
  let colorantId: string;
  beforeAll(async () => {
    maker = await signInAs('maker@demo.test', 'pourproof-demo', '10.60.0.1');
    colorantId = (await api('/api/colorants', { cookie: maker })).body.find((c: any) => c.kind === 'pigment').id;
  });

  it('runs create → target → two pours, with figures that agree with culori', async () => {
    const created = await api('/api/matches', { cookie: maker, body: { name: 'Test craw', zones: ['back', 'belly'], notes: 'two-tone' } });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ name: 'Test craw', status: 'open', zones: ['back', 'belly'], tolerance: 2, target: null, pours: [], standardPourId: null });
    const matchId = created.body.id;

    // A pour before the target is a 409 with a clear message.
    const early = await api(`/api/matches/${matchId}/pours`, { cookie: maker, body: { photoId: 'x', recipe: [], zones: [{ name: 'back', shape: BACK_SHAPE }] } });
    expect(early.status).toBe(409);
    expect(early.body.error.message).toMatch(/target/i);

    const ref = await uploadPhoto(maker, await twoTonePng(TARGET.back, TARGET.belly), 'reference');
    const target = await api(`/api/matches/${matchId}/target`, {
      cookie: maker,
      body: { photoId: ref.id, zones: [{ name: 'back', shape: BACK_SHAPE }, { name: 'belly', shape: BELLY_SHAPE }] },
    });
    expect(target.status).toBe(200);
    for (const zone of ['back', 'belly'] as const) {
      const got = target.body.target.zones.find((z: any) => z.name === zone);
      const known = labOf(TARGET[zone]);
      expect(de00(lab65(known.l, known.a, known.b), lab65(got.lab.l, got.lab.a, got.lab.b)), zone).toBeLessThanOrEqual(1.0);
      expect(got.hex).toMatch(/^#[0-9a-f]{6}$/);
    }

    const numbers: number[] = [];
    for (const colours of [POUR1, POUR2]) {
      const photo = await uploadPhoto(maker, await twoTonePng(colours.back, colours.belly), 'pour');
      const pour = await api(`/api/matches/${matchId}/pours`, {
        cookie: maker,
        body: {
          photoId: photo.id,
          recipe: [{ zone: 'back', colorantId, amount: 6, unit: 'drops' }],
          batchCups: 1,
          tempF: 340,
          zones: [{ name: 'back', shape: BACK_SHAPE }, { name: 'belly', shape: BELLY_SHAPE }],
        },
      });
      expect(pour.status).toBe(201);
      numbers.push(pour.body.number);
      for (const zone of ['back', 'belly'] as const) {
        const z = pour.body.zones.find((x: any) => x.name === zone);
        const t = labOf(TARGET[zone]);
        const p = labOf(colours[zone]);
        const expected = de00(lab65(t.l, t.a, t.b), lab65(p.l, p.a, p.b));
        expect(Math.abs(z.dE00 - expected), `${zone}: ${z.dE00} vs ${expected}`).toBeLessThanOrEqual(0.5);
        expect(['indistinguishable', 'close', 'noticeable', 'off']).toContain(z.band);
        // API.md: the ± of dE00 from both measurements, and no in-frame reference marked.
        expect(z.uncertainty).toBeGreaterThan(0);
        expect(z.uncertainty).toBeLessThan(1.5);
        expect(z.inFrame).toBeNull();
      }
      expect(pour.body.recipe).toEqual([expect.objectContaining({ zone: 'back', colorantId, amount: 6, unit: 'drops' })]);
      const again = await api(`/api/pours/${pour.body.id}`, { cookie: maker });
      expect(again.status).toBe(200);
      expect(again.body.number).toBe(pour.body.number);
    }
    expect(numbers).toEqual([1, 2]);

    // The reference in frame: the back zone compared with a region of the same photo (here the
    // belly half stands in for a reference bait lying beside the pour).
    const photo3 = await uploadPhoto(maker, await twoTonePng(POUR2.back, TARGET.back), 'pour');
    const pour3 = await api(`/api/matches/${matchId}/pours`, {
      cookie: maker,
      body: { photoId: photo3.id, recipe: [], zones: [{ name: 'back', shape: BACK_SHAPE, reference: BELLY_SHAPE }] },
    });
    expect(pour3.status).toBe(201);
    const z3 = pour3.body.zones.find((x: any) => x.name === 'back');
    const ref3 = labOf(TARGET.back);
    const own3 = labOf(POUR2.back);
    expect(de00(lab65(ref3.l, ref3.a, ref3.b), lab65(z3.inFrame.lab.l, z3.inFrame.lab.a, z3.inFrame.lab.b))).toBeLessThanOrEqual(1.0);
    expect(Math.abs(z3.inFrame.dE00 - de00(lab65(ref3.l, ref3.a, ref3.b), lab65(own3.l, own3.a, own3.b)))).toBeLessThanOrEqual(0.5);
    expect(z3.inFrame).toMatchObject({ dL: expect.any(Number), dC: expect.any(Number), dH: expect.any(Number), band: expect.any(String) });
    expect((await api(`/api/pours/${pour3.body.id}`, { cookie: maker })).body.zones[0].inFrame.dE00).toBeCloseTo(z3.inFrame.dE00, 9);
    const match = await api(`/api/matches/${matchId}`, { cookie: maker });
    expect(match.body.pours.map((p: any) => p.number)).toEqual([1, 2, 3]);

    // A viewer may read but not pour; another shop sees nothing.
    const viewer = await signInAs('viewer@demo.test', 'pourproof-demo', '10.60.0.2');
    expect((await api(`/api/matches/${matchId}`, { cookie: viewer })).status).toBe(200);
    const denied = await api(`/api/matches/${matchId}/pours`, { cookie: viewer, body: { photoId: ref.id, recipe: [], zones: [{ name: 'back', shape: BACK_SHAPE }] } });
    expect(denied.status).toBe(403);
    expect((await api('/api/matches', { cookie: viewer, body: { name: 'x', zones: ['back'] } })).status).toBe(403);
    const stranger = await signUpShop('Stranger shop');
    expect((await api(`/api/matches/${matchId}`, { cookie: stranger.cookie })).status).toBe(404);
    expect((await api(`/api/pours/${pour1Id(match.body)}`, { cookie: stranger.cookie })).status).toBe(404);

    // Bad input: the field is named, nothing is stored.
    const bad: [unknown, RegExp][] = [
      [{ photoId: ref.id, recipe: [{ zone: 'back', colorantId: 'nope', amount: 1, unit: 'drops' }], zones: [{ name: 'back', shape: BACK_SHAPE }] }, /recipe\[0\]\.colorantId/],
      [{ photoId: ref.id, recipe: [{ zone: 'back', colorantId, amount: -2, unit: 'drops' }], zones: [{ name: 'back', shape: BACK_SHAPE }] }, /recipe\[0\]\.amount/],
      [{ photoId: ref.id, recipe: [{ zone: 'back', colorantId, amount: 90000, unit: 'drops' }], zones: [{ name: 'back', shape: BACK_SHAPE }] }, /recipe\[0\]\.amount/],
      [{ photoId: ref.id, recipe: [{ zone: 'fin', colorantId, amount: 1, unit: 'drops' }], zones: [{ name: 'back', shape: BACK_SHAPE }] }, /recipe\[0\]\.zone/],
      [{ photoId: ref.id, recipe: [], zones: [{ name: 'tail', shape: BACK_SHAPE }] }, /zones\[0\]\.name/],
      [{ photoId: ref.id, recipe: [], zones: [{ name: 'back', shape: { type: 'ellipse', cx: 0.5, cy: 0.5, rx: 0, ry: 0.1 } }] }, /zones\[0\]\.shape\.rx/],
      [{ photoId: ref.id, recipe: [], zones: [{ name: 'back', shape: { type: 'rect', x: 0.5, y: 0.5, w: 0.9, h: 0.1 } }] }, /zones\[0\]\.shape/],
    ];
    for (const [body, field] of bad) {
      const res = await api(`/api/matches/${matchId}/pours`, { cookie: maker, body });
      expect(res.status, JSON.stringify(body)).toBe(400);
      expectErrorShape(res.body);
      expect(res.body.error.message).toMatch(field);
    }
    expect((await api(`/api/matches/${matchId}`, { cookie: maker })).body.pours).toHaveLength(3);
  });
});

function pour1Id(match: { pours: { id: string; number: number }[] }) {
  return match.pours.find((p) => p.number === 1)!.id;
}
