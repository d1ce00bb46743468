import { beforeAll, describe, expect, it } from 'vitest';
import { api, expectErrorShape, signInAs } from '../support/http';
import { BACK_SHAPE, BELLY_SHAPE, labToRgb8, twoTonePng, uploadPhoto } from '../support/photos';

const TARGET = { back: labToRgb8({ l: 38, a: 10, b: 22 }), belly: labToRgb8({ l: 62, a: 12, b: 30 }) };
const ZONES = [{ name: 'back', shape: BACK_SHAPE }, { name: 'belly', shape: BELLY_SHAPE }];
// 1 tsp = 1/48 cup = 4.92892159375 mL (NIST Handbook 44, Appendix C); the demo shop's dropper is 20 drops per mL.
const ML_PER_TSP = (231 * 25.4 ** 3) / 1000 / 16 / 48;

describe('doses through the API: typed as said, stored in the library unit', () => {
  let maker: string;
  let matchId: string;
  let pigment: { id: string; name: string };
  let pearl: { id: string; name: string };
  let byWeight: { id: string; name: string };
  beforeAll(async () => {
    maker = await signInAs('maker@demo.test', 'pourproof-demo', '10.73.0.1');
    const owner = await signInAs('owner@demo.test', 'pourproof-demo', '10.73.0.2');
    const colorants = (await api('/api/colorants', { cookie: maker })).body as any[];
    pigment = colorants.find((c) => c.kind === 'pigment' && c.unit === 'drops');
    pearl = colorants.find((c) => c.kind === 'pearl' && c.unit === 'tsp');
    const made = await api('/api/colorants', { cookie: owner, body: { name: `Mica by weight ${Date.now().toString(36)}`, kind: 'pearl', unit: 'g' } });
    expect(made.status).toBe(201);
    byWeight = made.body;
    matchId = (await api('/api/matches', { cookie: maker, body: { name: `Doses ${Date.now().toString(36)}`, zones: ['back', 'belly'] } })).body.id;
    const ref = await uploadPhoto(maker, await twoTonePng(TARGET.back, TARGET.belly), 'reference');
    expect((await api(`/api/matches/${matchId}/target`, { cookie: maker, body: { photoId: ref.id, zones: ZONES } })).status).toBe(200);
  });

  async function pourWith(recipe: unknown[]) {
    const photo = await uploadPhoto(maker, await twoTonePng(TARGET.back, TARGET.belly), 'pour');
    return api(`/api/matches/${matchId}/pours`, { cookie: maker, body: { photoId: photo.id, recipe, zones: ZONES } });
  }

  it('reads "1/2", "1 1/4", "¼" and "0,5", and converts mL and tsp into the colorant’s unit', async () => {
    const res = await pourWith([
      { zone: 'back', colorantId: pigment.id, amount: '1 1/4', unit: 'drops' },
      { zone: 'back', colorantId: pearl.id, amount: '¼', unit: 'tsp' },
      { zone: 'belly', colorantId: pigment.id, amount: '1/2', unit: 'ml' },
      { zone: 'belly', colorantId: pearl.id, amount: '0,5', unit: 'ml' },
      { zone: 'belly', colorantId: byWeight.id, amount: 1.5, unit: 'g' },
    ]);
    expect(res.status).toBe(201);
    const recipe = (await api(`/api/pours/${res.body.id}`, { cookie: maker })).body.recipe as any[];
    expect(recipe.map((l) => l.unit)).toEqual(['drops', 'tsp', 'drops', 'tsp', 'g']);
    expect(recipe[0].amount).toBeCloseTo(1.25, 12);
    expect(recipe[1].amount).toBeCloseTo(0.25, 12);
    expect(recipe[2].amount).toBeCloseTo(10, 9); // ½ mL × 20 drops per mL
    expect(recipe[3].amount).toBeCloseTo(0.5 / ML_PER_TSP, 9);
    expect(recipe[4].amount).toBeCloseTo(1.5, 12);
  });

  it('refuses what cannot be read or converted, with the reason, and stores nothing', async () => {
    const before = (await api(`/api/matches/${matchId}`, { cookie: maker })).body.pours.length;
    const cases: [unknown[], number, RegExp][] = [
      [[{ zone: 'back', colorantId: pigment.id, amount: '1/0', unit: 'drops' }], 400, /^recipe\[0\]\.amount: "1\/0" divides by zero$/],
      [[{ zone: 'back', colorantId: pigment.id, amount: 'abc', unit: 'drops' }], 400, /^recipe\[0\]\.amount: "abc" is not an amount/],
      [[{ zone: 'back', colorantId: pigment.id, amount: '0', unit: 'drops' }], 400, /^recipe\[0\]\.amount: amount must be more than 0$/],
      [[{ zone: 'back', colorantId: pigment.id, amount: 2, unit: 'g' }], 422, new RegExp(`^recipe\\[0\\]\\.unit: ${pigment.name} is dosed in drops in the library; 2 g cannot be converted`)],
      [[{ zone: 'back', colorantId: pigment.id, amount: 2, unit: 'drops' }, { zone: 'back', colorantId: byWeight.id, amount: '1/2', unit: 'tsp' }], 422, /^recipe\[1\]\.unit: .* is dosed in g/],
    ];
    for (const [recipe, status, message] of cases) {
      const res = await pourWith(recipe);
      expect(res.status, JSON.stringify(recipe)).toBe(status);
      expectErrorShape(res.body);
      expect(res.body.error.message).toMatch(message);
    }
    expect((await api(`/api/matches/${matchId}`, { cookie: maker })).body.pours).toHaveLength(before);
  });
});
