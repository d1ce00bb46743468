import { beforeAll, describe, expect, it } from 'vitest';
import { api, expectErrorShape, signUpShop } from '../support/http';

// Mold library writes, and bad input to both libraries: 400 naming the field,
// never a 500, nothing written. Runs in a fresh shop (its owner ≥ lead).

const TEN_KB = 'n'.repeat(10_000);
const GOOD_COLORANT = { name: 'Pigment, slate grey', kind: 'pigment', unit: 'drops' };
const GOOD_MOLD = { name: 'Stick worm 6 in, 3 cavity', bodyStyle: 'stick worm', lengthIn: 6, cavities: 3, mlPerCavity: 11.5, thickness: 'thick' };

describe('mold library API', () => {
  let owner: string;
  beforeAll(async () => {
    owner = (await signUpShop('Mold shop')).cookie;
  });

  it('creates, edits and archives a mold', async () => {
    const made = await api('/api/molds', { cookie: owner, body: GOOD_MOLD });
    expect(made.status).toBe(201);
    expect(made.body).toMatchObject({ ...GOOD_MOLD, archivedAt: null });
    expect(made.body).not.toHaveProperty('teamId');
    expect((await api('/api/molds', { cookie: owner })).body).toContainEqual(made.body);

    const edited = await api(`/api/molds/${made.body.id}`, { method: 'PATCH', cookie: owner, body: { thickness: 'standard', lengthIn: null, mlPerCavity: 10.8 } });
    expect(edited.status).toBe(200);
    expect(edited.body).toMatchObject({ name: GOOD_MOLD.name, thickness: 'standard', lengthIn: null, cavities: 3 });
    expect(edited.body.mlPerCavity).toBeCloseTo(10.8, 9);

    const dup = await api('/api/molds', { cookie: owner, body: { ...GOOD_MOLD, cavities: 1 } });
    expect(dup.status).toBe(409);
    expect(dup.body.error.message).toMatch(/^a mold named .* already exists/);

    const archived = await api(`/api/molds/${made.body.id}`, { method: 'DELETE', cookie: owner });
    expect(archived.status).toBe(200);
    expect(archived.body).toEqual({ id: made.body.id, archived: true });
    expect((await api('/api/molds', { cookie: owner })).body).toEqual([]);
  });

  it('answers 400 naming the field for bad colorants, and writes nothing', async () => {
    const cases: [string, unknown, RegExp][] = [
      ['missing name', { kind: 'pigment', unit: 'drops' }, /^name: /],
      ['blank name', { ...GOOD_COLORANT, name: '   ' }, /^name: /],
      ['10 KB name', { ...GOOD_COLORANT, name: TEN_KB }, /^name: .*80/],
      ['unknown kind', { ...GOOD_COLORANT, kind: 'sparkle' }, /^kind: .*pigment/],
      ['unknown unit', { ...GOOD_COLORANT, unit: 'cups' }, /^unit: /],
      ['flake without a size', { name: 'Flake, silver', kind: 'flake', unit: 'tsp' }, /^flakeSizeIn: .*inches/],
      ['flake too large', { name: 'Flake, silver', kind: 'flake', unit: 'tsp', flakeSizeIn: 0.5 }, /^flakeSizeIn: /],
      ['negative cost', { ...GOOD_COLORANT, costPerUnit: -0.01 }, /^costPerUnit: .*negative/],
      ['cost as text', { ...GOOD_COLORANT, costPerUnit: 'cheap' }, /^costPerUnit: .*number/],
      ['negative stock', { ...GOOD_COLORANT, stock: -3 }, /^stock: /],
      ['swatch out of range', { ...GOOD_COLORANT, swatch: { l: 120, a: 0, b: 0 } }, /^swatch\.l: /],
      ['swatch missing b', { ...GOOD_COLORANT, swatch: { l: 50, a: 0 } }, /^swatch\.b: /],
      ['long flake colour', { name: 'Flake, x', kind: 'flake', unit: 'tsp', flakeSizeIn: 0.02, flakeColor: TEN_KB }, /^flakeColor: /],
      ['long notes', { ...GOOD_COLORANT, notes: 'n'.repeat(2001) }, /^notes: /],
      ['array body', [], /object/],
    ];
    for (const [label, body, message] of cases) {
      const res = await api('/api/colorants', { cookie: owner, body });
      expect(res.status, label).toBe(400);
      expectErrorShape(res.body);
      expect(res.body.error.message, label).toMatch(message);
      expect(res.body.error.message.length, label).toBeLessThan(300);
    }
    for (const raw of ['', '{"name": ', 'null']) {
      expect((await api('/api/colorants', { cookie: owner, raw })).status, raw).toBe(400);
    }
    expect((await api('/api/colorants', { cookie: owner })).body).toEqual([]);
  });

  it('answers 400 naming the field for bad molds and bad edits', async () => {
    const cases: [string, unknown, RegExp][] = [
      ['missing name', { ...GOOD_MOLD, name: undefined }, /^name: /],
      ['10 KB name', { ...GOOD_MOLD, name: TEN_KB }, /^name: /],
      ['cavities 0', { ...GOOD_MOLD, cavities: 0 }, /^cavities: .*at least 1/],
      ['cavities 2.5', { ...GOOD_MOLD, cavities: 2.5 }, /^cavities: .*whole/],
      ['cavities 51', { ...GOOD_MOLD, cavities: 51 }, /^cavities: /],
      ['no plastisol per cavity', { ...GOOD_MOLD, mlPerCavity: undefined }, /^mlPerCavity: /],
      ['plastisol per cavity 0.05', { ...GOOD_MOLD, mlPerCavity: 0.05 }, /^mlPerCavity: .*mL/],
      ['length 30 in', { ...GOOD_MOLD, lengthIn: 30 }, /^lengthIn: .*in/],
      ['blank body style', { ...GOOD_MOLD, bodyStyle: '' }, /^bodyStyle: /],
      ['unknown thickness', { ...GOOD_MOLD, thickness: 'medium' }, /^thickness: .*thin/],
    ];
    for (const [label, body, message] of cases) {
      const res = await api('/api/molds', { cookie: owner, body });
      expect(res.status, label).toBe(400);
      expectErrorShape(res.body);
      expect(res.body.error.message, label).toMatch(message);
    }

    const mold = (await api('/api/molds', { cookie: owner, body: { ...GOOD_MOLD, name: 'Edit target' } })).body;
    const colorant = (await api('/api/colorants', { cookie: owner, body: GOOD_COLORANT })).body;
    const edits: [string, unknown, RegExp][] = [
      [`/api/molds/${mold.id}`, { cavities: 0 }, /^cavities: /],
      [`/api/molds/${mold.id}`, { name: null }, /^name: /],
      [`/api/molds/${mold.id}`, {}, /no field/],
      [`/api/colorants/${colorant.id}`, { kind: 'sparkle' }, /^kind: /],
      [`/api/colorants/${colorant.id}`, { costPerUnit: -1 }, /^costPerUnit: /],
      [`/api/colorants/${colorant.id}`, { name: TEN_KB }, /^name: /],
    ];
    for (const [path, body, message] of edits) {
      const res = await api(path, { method: 'PATCH', cookie: owner, body });
      expect(res.status, JSON.stringify(body).slice(0, 40)).toBe(400);
      expect(res.body.error.message).toMatch(message);
    }
    expect((await api('/api/molds', { cookie: owner })).body).toEqual([expect.objectContaining({ name: 'Edit target', cavities: 3 })]);
    expect((await api('/api/colorants', { cookie: owner })).body).toEqual([expect.objectContaining({ name: GOOD_COLORANT.name, kind: 'pigment', costPerUnit: null })]);
  });
});
