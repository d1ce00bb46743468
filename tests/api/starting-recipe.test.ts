import { describe, expect, it } from 'vitest';
import { renderPour } from '../color/sim/render';
import { COLORANTS, trueLab } from '../color/sim/shop';
import { api, baseUrl, expectErrorShape, signUpShop } from '../support/http';
import { BACK_SHAPE, BELLY_SHAPE } from '../support/photos';

// Calibration swatches feed the shop's colorant model; the starting recipe answers from it.
// Colours come from the simulated colorant system (tests/color/sim, invented colorants).
async function upload(cookie: string, bytes: Buffer, kind: string) {
  const form = new FormData();
  form.set('kind', kind);
  form.set('image', new Blob([new Uint8Array(bytes)], { type: 'image/jpeg' }), 'x.jpg');
  const res = await fetch(`${baseUrl()}/api/photos`, { method: 'POST', body: form, headers: { origin: baseUrl(), cookie } });
  return ((await res.json()) as { id: string }).id;
}
const photo = (cookie: string, doses: number[], seed: number, kind = 'swatch') => renderPour(trueLab(doses), trueLab(doses), seed).then((b) => upload(cookie, b, kind));
const only = (i: number, d: number) => COLORANTS.map((_, j) => (i === j ? d : 0));

describe('calibration swatches and the starting recipe', () => {
  it('answers 409 without a target, 422 naming uncalibrated colorants, and a predicted recipe once calibrated', async () => {
    const { cookie } = await signUpShop('Starting recipe shop');
    const base = (await api('/api/colorants', { cookie, body: { name: 'Sim base', kind: 'base', unit: 'ml' } })).body.id;
    const ids: string[] = [];
    for (const c of COLORANTS.slice(0, 3)) ids.push((await api('/api/colorants', { cookie, body: { name: c.name, kind: c.kind, unit: c.unit } })).body.id);
    const match = (await api('/api/matches', { cookie, body: { name: 'Orange-ish', zones: ['back', 'belly'] } })).body;

    expect((await api(`/api/matches/${match.id}/starting-recipe`, { cookie, body: {} })).status).toBe(409);
    const truth = [[0.5, 2.5, 0, 0, 0, 0], [1, 3, 0, 0, 0, 0]];
    const ref = await renderPour(trueLab(truth[0]!), trueLab(truth[1]!), 77).then((b) => upload(cookie, b, 'reference'));
    const zones = [{ name: 'back', shape: BACK_SHAPE }, { name: 'belly', shape: BELLY_SHAPE }];
    expect((await api(`/api/matches/${match.id}/target`, { cookie, body: { photoId: ref, zones } })).status).toBe(200);

    const none = await api(`/api/matches/${match.id}/starting-recipe`, { cookie, body: {} });
    expect(none.status).toBe(422);
    expectErrorShape(none.body);
    expect(none.body.error.message).toContain('Sim red');

    // Bad swatches: a unit the colorant is not dosed in, a zero dose of a pigment, another team's colorant.
    const p0 = await photo(cookie, only(0, 3), 1);
    expect((await api(`/api/colorants/${ids[0]}/swatches`, { cookie, body: { photoId: p0, shape: BACK_SHAPE, amount: 3, unit: 'g' } })).status).toBe(400);
    expect((await api(`/api/colorants/${ids[0]}/swatches`, { cookie, body: { photoId: p0, shape: BACK_SHAPE, amount: 0 } })).status).toBe(400);
    const stranger = await signUpShop('Swatch stranger');
    expect((await api(`/api/colorants/${ids[0]}/swatches`, { cookie: stranger.cookie, body: { photoId: p0, shape: BACK_SHAPE, amount: 3 } })).status).toBe(404);

    const sw = await api(`/api/colorants/${base}/swatches`, { cookie, body: { photoId: await photo(cookie, only(0, 0), 2), shape: BACK_SHAPE, amount: 0 } });
    expect(sw.status).toBe(201);
    expect(sw.body.amount).toBe(0);
    for (const [i, id] of ids.slice(0, 2).entries()) {
      for (const d of [1.5, 4]) {
        const r = await api(`/api/colorants/${id}/swatches`, { cookie, body: { photoId: await photo(cookie, only(i, d), 10 + i * 2 + d), shape: BACK_SHAPE, amount: d } });
        expect(r.status).toBe(201);
      }
    }
    const ch = await api('/api/colorants/characterisation', { cookie });
    expect(ch.status).toBe(200);
    const byName = Object.fromEntries(ch.body.map((c: { colorant: string }) => [c.colorant, c]));
    expect(byName['Sim red'].characterised).toBe(true);
    expect(byName['Sim red'].swatches).toBe(2);
    expect(byName['Sim blue'].characterised).toBe(false);

    const partial = await api(`/api/matches/${match.id}/starting-recipe`, { cookie, body: { colorantIds: [ids[0], ids[2]] } });
    expect(partial.status).toBe(422);
    expect(partial.body.error.message).toContain('Sim blue');

    const res = await api(`/api/matches/${match.id}/starting-recipe`, { cookie, body: {} });
    expect(res.status).toBe(200);
    expect(res.body.zones.map((z: { zone: string }) => z.zone)).toEqual(['back', 'belly']);
    for (const z of res.body.zones) {
      expect(z.recipe.length).toBeGreaterThan(0);
      for (const l of z.recipe) {
        expect(ids.slice(0, 2)).toContain(l.colorantId);
        expect(l.unit).toBe('drops');
        expect((l.amount * 2) % 1).toBeCloseTo(0, 9); // half-drop steps
      }
      // Only red and yellow are calibrated, and both targets are mixes of those two.
      expect(z.predicted.dE00).toBeLessThan(4);
    }
    // The recipe is one the pour route takes.
    const recipe = res.body.zones.flatMap((z: { zone: string; recipe: { colorantId: string; amount: number; unit: string }[] }) => z.recipe.map((l) => ({ zone: z.zone, colorantId: l.colorantId, amount: l.amount, unit: l.unit })));
    const pourPhoto = await photo(cookie, truth[0]!, 99, 'pour');
    expect((await api(`/api/matches/${match.id}/pours`, { cookie, body: { photoId: pourPhoto, zones, recipe } })).status).toBe(201);
  });
});
