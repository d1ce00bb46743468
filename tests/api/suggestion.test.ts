import { describe, expect, it } from 'vitest';
import { api, signInAs, signUpShop } from '../support/http';
import { BACK_SHAPE, BELLY_SHAPE, labToRgb8, twoTonePng, uploadPhoto } from '../support/photos';

// A made-up pigment that darkens and blues the back by (−2, −0.5, −4) Lab per
// drop per cup (invented numbers, the truth of this test): after two pours the
// shop's history knows it, and the third pour's suggestion moves the dose back
// toward the 4 drops that matched. This response is linear in Lab, which the
// Kubelka–Munk model only approximates, so the trust region may stop the step
// half a drop short; the full proof is tests/api/next-pour-sim.test.ts.
const BELLY = labToRgb8({ l: 70, a: 5, b: 10 });
const backAt = (drops: number) => labToRgb8({ l: 44 - 2 * drops, a: 1 - 0.5 * drops, b: 8 - 4 * drops });

describe('GET /api/pours/:id/suggestion', () => {
  it('learns a colorant from earlier pours and suggests the dose that reaches the target', async () => {
    const maker = await signInAs('maker@demo.test', 'pourproof-demo', '10.80.0.1');
    const colorants = (await api('/api/colorants', { cookie: maker })).body as { id: string; name: string }[];
    const blue = colorants.find((c) => c.name === 'Pigment, lamp blue')!;
    const match = (await api('/api/matches', { cookie: maker, body: { name: `Suggestion test ${Date.now()}`, zones: ['back', 'belly'] } })).body;
    const zones = [{ name: 'back', shape: BACK_SHAPE }, { name: 'belly', shape: BELLY_SHAPE }];
    const ref = await uploadPhoto(maker, await twoTonePng(backAt(4), BELLY), 'reference');
    expect((await api(`/api/matches/${match.id}/target`, { cookie: maker, body: { photoId: ref.id, zones } })).status).toBe(200);

    let last = '';
    for (const drops of [2, 4, 3]) {
      const photo = await uploadPhoto(maker, await twoTonePng(backAt(drops), BELLY), 'pour');
      const res = await api(`/api/matches/${match.id}/pours`, {
        cookie: maker,
        body: { photoId: photo.id, recipe: [{ zone: 'back', colorantId: blue.id, amount: drops, unit: 'drops' }], zones },
      });
      expect(res.status).toBe(201);
      last = res.body.id;
    }
    const res = await api(`/api/pours/${last}/suggestion`, { cookie: maker });
    expect(res.status).toBe(200);
    const back = res.body.zones.find((z: { zone: string }) => z.zone === 'back');
    const belly = res.body.zones.find((z: { zone: string }) => z.zone === 'belly');
    expect(back.status).toBe('suggested');
    expect(back.changes).toHaveLength(1);
    expect(back.changes[0]).toMatchObject({ colorantId: blue.id, colorant: 'Pigment, lamp blue', unit: 'drops', from: 3 });
    expect([3.5, 4]).toContain(back.changes[0].to);
    expect(back.predicted.dE00).toBeLessThan(back.dE00);
    expect(back.learntFrom).toMatch(/with lamp blue/);
    expect(belly.status).toBe('within_tolerance');

    const stranger = await signUpShop('Suggestion stranger');
    expect((await api(`/api/pours/${last}/suggestion`, { cookie: stranger.cookie })).status).toBe(404);
    expect((await api(`/api/pours/${last}/suggestion`)).status).toBe(401);
  });
});
