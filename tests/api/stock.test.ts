import Database from 'better-sqlite3';
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { api, expectErrorShape } from '../support/http';
import { twoTonePng, uploadPhoto } from '../support/photos';
import { COLOURS, ZONES, shopWithStandard } from '../support/shop';

// 1 cup = 231 in³ × 16.387064 mL/in³ ÷ 16 (NIST Handbook 44, Appendix C).
const ML_PER_CUP = (231 * 25.4 ** 3) / 1000 / 16;

describe('stock that moves with batches', () => {
  let s: Awaited<ReturnType<typeof shopWithStandard>>;
  beforeAll(async () => {
    s = await shopWithStandard({ flakeStock: 0.5 });
  });

  it('opens each colorant’s ledger with the stock it was created with', async () => {
    const pig = await s.stockOf(s.pigment.id);
    expect(pig).toMatchObject({ stock: 200, lowStockAt: 150, low: false, unit: 'drops' });
    expect(pig.movements).toEqual([expect.objectContaining({ kind: 'adjustment', amount: 200, balance: 200, note: 'opening stock' })]);
  });

  it('a 6-cup laminate split 4 + 2 moves exactly its doses out, in each colorant’s unit, and says where stock went below zero', async () => {
    const res = await s.logBatch({ cups: 6, zoneCups: [{ zone: 'back', cups: 4 }, { zone: 'belly', cups: 2 }] });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.zoneCups).toEqual([{ zone: 'back', cups: 4 }, { zone: 'belly', cups: 2 }]);
    // Pigment: 6 drops × 4 cups (back) + 2 drops × 2 cups (belly) = 28 drops.
    const pig = await s.stockOf(s.pigment.id);
    expect(pig.stock).toBeCloseTo(200 - 28, 9);
    expect(pig.movements[0]).toMatchObject({ kind: 'batch', batchId: res.body.id });
    expect(pig.movements[0].amount).toBeCloseTo(-28, 9);
    // Flake: ¼ tsp × 4 cups = 1 tsp out of 0.5 tsp on the shelf.
    expect((await s.stockOf(s.flake.id)).stock).toBeCloseTo(-0.5, 9);
    // Plastisol: 6 cups of 236.5882365 mL from the base, kept in mL.
    expect((await s.stockOf(s.base.id)).stock).toBeCloseTo(5000 - 6 * ML_PER_CUP, 6);
    expect(res.body.belowZero).toEqual(['Flake, black']);
    expect(res.body.stock.map((m: any) => m.name).sort()).toEqual(['Base, medium', 'Flake, black', 'Pigment, moss']);
  });

  it('costs the batch per bait and names the line without a cost', async () => {
    const res = await s.logBatch({ cups: 2, baits: 40 });
    expect(res.status).toBe(201);
    const cost = res.body.cost;
    // 2 cups split evenly: pigment 6×1 + 2×1 = 8 drops × 0.02; base 2 cups × 0.01 per mL; flake has no cost.
    const total = 8 * 0.02 + 2 * ML_PER_CUP * 0.01;
    expect(cost.currency).toBe('USD');
    expect(cost.total).toBeCloseTo(total, 9);
    expect(cost.missing).toEqual(['Flake, black']);
    expect(cost.complete).toBe(false);
    expect(cost.perBait).toBeCloseTo(total / 40, 9);
    expect(cost.molds[0].perBait).toBeCloseTo((total / (2 * ML_PER_CUP)) * 9.5, 9); // sprue 0 in a new shop
  });

  it('a failed request moves nothing', async () => {
    const before = await Promise.all([s.pigment.id, s.flake.id, s.base.id].map(s.stockOf));
    const bad = await s.logBatch({ cups: 6, zoneCups: [{ zone: 'back', cups: 4 }, { zone: 'belly', cups: 1 }] });
    expect(bad.status).toBe(400);
    expectErrorShape(bad.body);
    expect(bad.body.error.message).toMatch(/add up to 5 cups/);
    const badBase = await s.logBatch({ cups: 2, baseColorantId: 'nope' });
    expect(badBase.status).toBe(400);
    const badPlan = await s.logBatch({ cups: 2, plan: [{ moldId: 'nope', shots: 2 }] });
    expect(badPlan.status).toBe(400);
    const after = await Promise.all([s.pigment.id, s.flake.id, s.base.id].map(s.stockOf));
    expect(after.map((c) => c.stock)).toEqual(before.map((c) => c.stock));
    expect(after.map((c) => c.movements.length)).toEqual(before.map((c) => c.movements.length));
  });

  it('two batches logged at once both move the shelf (no lost update)', async () => {
    const before = (await s.stockOf(s.pigment.id)).stock;
    const [a, b] = await Promise.all([s.logBatch({ cups: 1 }), s.logBatch({ cups: 3 })]);
    expect([a.status, b.status]).toEqual([201, 201]);
    // Even split: (6 + 2) drops per cup of each zone × half the cups.
    const after = await s.stockOf(s.pigment.id);
    expect(after.stock).toBeCloseTo(before - 8 * 0.5 - 8 * 1.5, 9);
    expect(after.movements.filter((m: any) => m.batchId === a.body.id || m.batchId === b.body.id)).toHaveLength(2);
  });

  it('records deliveries and adjustments with a note, and marks low stock', async () => {
    const low = await s.stockOf(s.pigment.id);
    expect(low.stock).toBeLessThan(150);
    expect(low.low).toBe(true);
    const noNote = await api(`/api/colorants/${s.pigment.id}/stock`, { cookie: s.cookie, body: { kind: 'adjustment', amount: -3, note: ' ' } });
    expect(noNote.status).toBe(400);
    const negDelivery = await api(`/api/colorants/${s.pigment.id}/stock`, { cookie: s.cookie, body: { kind: 'delivery', amount: -3, note: 'x' } });
    expect(negDelivery.status).toBe(400);
    const del = await api(`/api/colorants/${s.pigment.id}/stock`, { cookie: s.cookie, body: { kind: 'delivery', amount: 500, note: 'two bottles' } });
    expect(del.status).toBe(201);
    expect(del.body.balance).toBeCloseTo(low.stock + 500, 9);
    const adj = await api(`/api/colorants/${s.pigment.id}/stock`, { cookie: s.cookie, body: { kind: 'adjustment', amount: -10, note: 'spilled' } });
    expect(adj.body.balance).toBeCloseTo(low.stock + 490, 9);
    const now = await s.stockOf(s.pigment.id);
    expect(now.low).toBe(false);
    expect(now.movements.slice(0, 2).map((m: any) => [m.kind, m.note])).toEqual([['adjustment', 'spilled'], ['delivery', 'two bottles']]);
    expect((await api('/api/colorants/nope/stock', { cookie: s.cookie })).status).toBe(404);
  });

  it('test pours draw from stock only when the shop’s setting says so', async () => {
    const pour = async () => {
      const photo = await uploadPhoto(s.cookie, await twoTonePng(COLOURS.back, COLOURS.belly), 'pour');
      const recipe = [{ zone: 'back', colorantId: s.pigment.id, amount: 4, unit: 'drops' }];
      const res = await api(`/api/matches/${s.match.id}/pours`, { cookie: s.cookie, body: { photoId: photo.id, recipe, batchCups: 2, zones: ZONES } });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      return res.body.id as string;
    };
    const before = (await s.stockOf(s.pigment.id)).stock;
    const baseBefore = (await s.stockOf(s.base.id)).stock;
    await pour();
    expect((await s.stockOf(s.pigment.id)).stock).toBe(before); // the setting is off in a new shop
    // The owner ticks "test pours draw from stock" (set here in the database; the form is tested in the browser).
    const raw = new Database(inject('dbFile'));
    raw.prepare('update teams set stock_draws_pours = 1 where id = ?').run(s.shop.body.team.id);
    raw.close();
    const id = await pour();
    const after = await s.stockOf(s.pigment.id);
    expect(after.stock).toBeCloseTo(before - 4 * 1, 9); // 2 cups split evenly: 1 cup of back at 4 drops per cup
    expect(after.movements[0]).toMatchObject({ kind: 'pour', pourId: id });
    expect((await s.stockOf(s.base.id)).stock).toBeCloseTo(baseBefore - 2 * ML_PER_CUP, 6);
  });

  it('a colorant whose stock the shop does not keep is not drawn into negative figures', async () => {
    const t = await shopWithStandard({ flakeStock: null });
    const res = await t.logBatch({ cups: 2 });
    expect(res.status).toBe(201);
    const flake = await t.stockOf(t.flake.id);
    expect(flake.stock).toBeNull();
    expect(flake.movements).toEqual([]);
    expect(res.body.stock.map((m: any) => m.name).sort()).toEqual(['Base, medium', 'Pigment, moss']);
    expect(res.body.belowZero).toEqual([]);
  });
});
