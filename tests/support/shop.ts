import { expect } from 'vitest';
import { api, signUpShop } from './http';
import { BACK_SHAPE, BELLY_SHAPE, labToRgb8, twoTonePng, uploadPhoto } from './photos';

export const ZONES = [{ name: 'back', shape: BACK_SHAPE }, { name: 'belly', shape: BELLY_SHAPE }];
export const COLOURS = { back: labToRgb8({ l: 38, a: 10, b: 22 }), belly: labToRgb8({ l: 62, a: 12, b: 30 }) };

// A fresh shop of its own (so no other test moves its stock) with a small
// library and one approved two-zone standard: back 6 drops pigment + ¼ tsp
// flake per cup, belly 2 drops pigment per cup.
export async function shopWithStandard(opts: { flakeStock?: number | null } = {}) {
  const shop = await signUpShop('Stock test shop');
  const cookie = shop.cookie;
  const add = async (path: string, body: object) => {
    const res = await api(path, { cookie, body });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return res.body;
  };
  const base = await add('/api/colorants', { name: 'Base, medium', kind: 'base', unit: 'ml', costPerUnit: 0.01, stock: 5000 });
  const pigment = await add('/api/colorants', { name: 'Pigment, moss', kind: 'pigment', unit: 'drops', costPerUnit: 0.02, stock: 200, lowStockAt: 150 });
  const flake = await add('/api/colorants', { name: 'Flake, black', kind: 'flake', unit: 'tsp', stock: opts.flakeStock === undefined ? 10 : opts.flakeStock, flakeSizeIn: 0.015 });
  const mold = await add('/api/molds', { name: 'Stick worm 5 in', bodyStyle: 'stick worm', cavities: 4, mlPerCavity: 9.5, thickness: 'standard' });
  const match = await add('/api/matches', { name: 'Moss over cream', zones: ['back', 'belly'] });
  const ref = await uploadPhoto(cookie, await twoTonePng(COLOURS.back, COLOURS.belly), 'reference');
  expect((await api(`/api/matches/${match.id}/target`, { cookie, body: { photoId: ref.id, zones: ZONES } })).status).toBe(200);
  const photo = await uploadPhoto(cookie, await twoTonePng(COLOURS.back, COLOURS.belly), 'pour');
  const recipe = [
    { zone: 'back', colorantId: pigment.id, amount: 6, unit: 'drops' },
    { zone: 'back', colorantId: flake.id, amount: 0.25, unit: 'tsp' },
    { zone: 'belly', colorantId: pigment.id, amount: 2, unit: 'drops' },
  ];
  const pour = await add(`/api/matches/${match.id}/pours`, { photoId: photo.id, recipe, moldId: mold.id, tempF: 340, zones: ZONES });
  expect((await api(`/api/pours/${pour.id}/submit`, { cookie, body: {} })).status).toBe(200);
  expect((await api(`/api/pours/${pour.id}/sign-off`, { cookie, body: { decision: 'approved' } })).status).toBe(200);
  const logBatch = async (extra: Record<string, unknown>) => {
    const p = await uploadPhoto(cookie, await twoTonePng(COLOURS.back, COLOURS.belly), 'batch');
    return api(`/api/matches/${match.id}/batches`, { cookie, body: { photoId: p.id, zones: ZONES, moldId: mold.id, ...extra } });
  };
  const stockOf = async (id: string) => (await api(`/api/colorants/${id}/stock`, { cookie })).body;
  return { shop, cookie, base, pigment, flake, mold, match, pour, logBatch, stockOf };
}
