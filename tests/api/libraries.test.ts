import { beforeAll, describe, expect, it } from 'vitest';
import { api, expectErrorShape, signInAs, signUpShop } from '../support/http';
import { BACK_SHAPE, twoTonePng, uploadPhoto } from '../support/photos';

// The colorant and mold libraries: leads and owners write, every member reads.
// Writes run in fresh shops (their owner is at least a lead) so the demo
// library other tests pick colorants and molds from stays as it is.

const unique = (label: string) => `${label} ${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 6)}`;

describe('colorant library API', () => {
  let owner: string;
  beforeAll(async () => {
    owner = (await signUpShop('Library shop')).cookie;
  });

  it('creates, edits and archives a colorant; the list answers in the same shape', async () => {
    const made = await api('/api/colorants', {
      cookie: owner,
      body: { name: 'Pigment, moss green', kind: 'pigment', unit: 'drops', costPerUnit: 0.02, stock: 500, swatch: { l: 41.5, a: -18.2, b: 22 }, notes: 'shake well' },
    });
    expect(made.status).toBe(201);
    expect(made.body).toMatchObject({ name: 'Pigment, moss green', kind: 'pigment', unit: 'drops', costPerUnit: 0.02, stock: 500, flakeSizeIn: null, flakeColor: null, notes: 'shake well', archivedAt: null });
    expect(made.body.swatch).toEqual({ l: 41.5, a: -18.2, b: 22 });
    expect(made.body).not.toHaveProperty('teamId');

    const list = await api('/api/colorants', { cookie: owner });
    expect(list.status).toBe(200);
    expect(list.body).toContainEqual(made.body);

    const edited = await api(`/api/colorants/${made.body.id}`, { method: 'PATCH', cookie: owner, body: { name: 'Pigment, pine green', stock: 420, swatch: null } });
    expect(edited.status).toBe(200);
    expect(edited.body).toMatchObject({ id: made.body.id, name: 'Pigment, pine green', stock: 420, costPerUnit: 0.02, swatch: null, notes: 'shake well' });

    const archived = await api(`/api/colorants/${made.body.id}`, { method: 'DELETE', cookie: owner });
    expect(archived.status).toBe(200);
    expect(archived.body).toEqual({ id: made.body.id, archived: true });
    const after = await api('/api/colorants', { cookie: owner });
    expect(after.body.map((c: { id: string }) => c.id)).not.toContain(made.body.id);
    // Gone from the library: editing or archiving it again is a 404.
    expect((await api(`/api/colorants/${made.body.id}`, { method: 'PATCH', cookie: owner, body: { stock: 1 } })).status).toBe(404);
    expect((await api(`/api/colorants/${made.body.id}`, { method: 'DELETE', cookie: owner })).status).toBe(404);
  });

  it('keeps a flake size for a flake, and a flake without one is a 400 on create and on edit', async () => {
    const flake = await api('/api/colorants', { cookie: owner, body: { name: 'Flake, copper 0.025 in', kind: 'flake', unit: 'tsp', flakeSizeIn: 0.025, flakeColor: 'copper' } });
    expect(flake.status).toBe(201);
    expect(flake.body).toMatchObject({ kind: 'flake', flakeSizeIn: 0.025, flakeColor: 'copper' });
    const cleared = await api(`/api/colorants/${flake.body.id}`, { method: 'PATCH', cookie: owner, body: { flakeSizeIn: null } });
    expect(cleared.status).toBe(400);
    expect(cleared.body.error.message).toMatch(/^flakeSizeIn: /);

    const pigment = await api('/api/colorants', { cookie: owner, body: { name: 'Pigment, dune tan', kind: 'pigment', unit: 'drops' } });
    const toFlake = await api(`/api/colorants/${pigment.body.id}`, { method: 'PATCH', cookie: owner, body: { kind: 'flake' } });
    expect(toFlake.status).toBe(400);
    expect(toFlake.body.error.message).toMatch(/^flakeSizeIn: /);
    // Nothing half-written: the failed edit left the pigment as it was.
    const still = (await api('/api/colorants', { cookie: owner })).body.find((c: { id: string }) => c.id === pigment.body.id);
    expect(still).toMatchObject({ kind: 'pigment', flakeSizeIn: null });
    // A flake that becomes a pearl drops the size it no longer has.
    const toPearl = await api(`/api/colorants/${flake.body.id}`, { method: 'PATCH', cookie: owner, body: { kind: 'pearl' } });
    expect(toPearl.body).toMatchObject({ kind: 'pearl', flakeSizeIn: null, flakeColor: null });
  });

  it('answers 409 for a name the team already uses (any case), and leaves the library as it was', async () => {
    const name = unique('Pearl, frost');
    expect((await api('/api/colorants', { cookie: owner, body: { name, kind: 'pearl', unit: 'tsp' } })).status).toBe(201);
    const before = (await api('/api/colorants', { cookie: owner })).body.length;
    const again = await api('/api/colorants', { cookie: owner, body: { name: name.toUpperCase(), kind: 'pearl', unit: 'g' } });
    expect(again.status).toBe(409);
    expectErrorShape(again.body);
    expect(again.body.error.message).toMatch(/^a colorant named .* already exists/);
    expect((await api('/api/colorants', { cookie: owner })).body.length).toBe(before);

    const other = await api('/api/colorants', { cookie: owner, body: { name: unique('Pearl, ice'), kind: 'pearl', unit: 'tsp' } });
    const rename = await api(`/api/colorants/${other.body.id}`, { method: 'PATCH', cookie: owner, body: { name } });
    expect(rename.status).toBe(409);
    // Another shop may use the same name.
    const stranger = (await signUpShop('Other library shop')).cookie;
    expect((await api('/api/colorants', { cookie: stranger, body: { name, kind: 'pearl', unit: 'tsp' } })).status).toBe(201);
  });

  it('archives a colorant a pour used: the pour still shows it by name', async () => {
    const colorant = (await api('/api/colorants', { cookie: owner, body: { name: 'Pigment, ember orange', kind: 'pigment', unit: 'drops' } })).body;
    const mold = (await api('/api/molds', { cookie: owner, body: { name: 'Grub 3 in, 5 cavity', bodyStyle: 'grub', lengthIn: 3, cavities: 5, mlPerCavity: 4.5, thickness: 'standard' } })).body;
    const match = (await api('/api/matches', { cookie: owner, body: { name: 'Archive check', zones: ['back'] } })).body;
    const ref = await uploadPhoto(owner, await twoTonePng([180, 90, 40], [200, 150, 90]), 'reference');
    expect((await api(`/api/matches/${match.id}/target`, { cookie: owner, body: { photoId: ref.id, zones: [{ name: 'back', shape: BACK_SHAPE }] } })).status).toBe(200);
    const photo = await uploadPhoto(owner, await twoTonePng([175, 95, 45], [200, 150, 90]), 'pour');
    const pour = await api(`/api/matches/${match.id}/pours`, {
      cookie: owner,
      body: { photoId: photo.id, moldId: mold.id, recipe: [{ zone: 'back', colorantId: colorant.id, amount: 6, unit: 'drops' }], zones: [{ name: 'back', shape: BACK_SHAPE }] },
    });
    expect(pour.status).toBe(201);

    expect((await api(`/api/colorants/${colorant.id}`, { method: 'DELETE', cookie: owner })).status).toBe(200);
    expect((await api(`/api/molds/${mold.id}`, { method: 'DELETE', cookie: owner })).status).toBe(200);
    const shown = await api(`/api/pours/${pour.body.id}`, { cookie: owner });
    expect(shown.status).toBe(200);
    expect(shown.body.recipe).toEqual([expect.objectContaining({ colorantId: colorant.id, colorant: 'Pigment, ember orange', amount: 6, unit: 'drops' })]);
    expect(shown.body).toMatchObject({ moldId: mold.id, mold: 'Grub 3 in, 5 cavity' });

    // A new pour cannot take the archived entries.
    const again = { photoId: photo.id, recipe: [{ zone: 'back', colorantId: colorant.id, amount: 6, unit: 'drops' }], zones: [{ name: 'back', shape: BACK_SHAPE }] };
    const refused = await api(`/api/matches/${match.id}/pours`, { cookie: owner, body: again });
    expect(refused.status).toBe(400);
    expect(refused.body.error.message).toMatch(/recipe\[0\]\.colorantId/);
    const noMold = await api(`/api/matches/${match.id}/pours`, { cookie: owner, body: { ...again, recipe: [], moldId: mold.id } });
    expect(noMold.status).toBe(400);
    expect(noMold.body.error.message).toMatch(/moldId/);
  });

  it('answers 404 for another team\'s colorant or mold, exactly as for a missing id', async () => {
    const mine = (await api('/api/colorants', { cookie: owner, body: { name: unique('Glow powder, pale'), kind: 'glow', unit: 'tsp' } })).body;
    const myMold = (await api('/api/molds', { cookie: owner, body: { name: unique('Tube 4 in'), bodyStyle: 'tube', cavities: 2, mlPerCavity: 8, thickness: 'thin' } })).body;
    const stranger = (await signUpShop('Stranger shop')).cookie;
    for (const [path, patch] of [[`/api/colorants/${mine.id}`, { stock: 1 }], [`/api/molds/${myMold.id}`, { cavities: 3 }]] as const) {
      const missing = path.replace(/[^/]+$/, 'no-such-id');
      const theirs = await api(path, { method: 'PATCH', cookie: stranger, body: patch });
      expect(theirs.status, path).toBe(404);
      expect(theirs.body).toEqual((await api(missing, { method: 'PATCH', cookie: stranger, body: patch })).body);
      const del = await api(path, { method: 'DELETE', cookie: stranger });
      expect(del.status, path).toBe(404);
      expect(del.body).toEqual((await api(missing, { method: 'DELETE', cookie: stranger })).body);
    }
    // Untouched in its own shop.
    const list = (await api('/api/colorants', { cookie: owner })).body.find((c: { id: string }) => c.id === mine.id);
    expect(list).toMatchObject({ stock: null });
    expect((await api('/api/molds', { cookie: owner })).body.find((m: { id: string }) => m.id === myMold.id)).toMatchObject({ cavities: 2 });
  });
});

describe('library roles in the demo shop', () => {
  it('lets the lead write; maker and viewer read but get 403 on every write', async () => {
    const lead = await signInAs('lead@demo.test', 'pourproof-demo', '10.91.0.1');
    // An additive and a 3-cavity mold: other tests pick the demo's pigments,
    // flakes and 4-cavity mold, so these never stand in for them.
    const colorant = await api('/api/colorants', { cookie: lead, body: { name: unique('Scent, test anise'), kind: 'additive', unit: 'ml' } });
    expect(colorant.status).toBe(201);
    const mold = await api('/api/molds', { cookie: lead, body: { name: unique('Test creature 4 in'), bodyStyle: 'creature', cavities: 3, mlPerCavity: 6, thickness: 'standard' } });
    expect(mold.status).toBe(201);
    try {
      for (const role of ['maker', 'viewer']) {
        const cookie = await signInAs(`${role}@demo.test`, 'pourproof-demo', '10.91.0.2');
        expect((await api('/api/colorants', { cookie })).status, role).toBe(200);
        expect((await api('/api/molds', { cookie })).status, role).toBe(200);
        const writes = [
          api('/api/colorants', { cookie, body: { name: unique('Not allowed'), kind: 'additive', unit: 'ml' } }),
          api(`/api/colorants/${colorant.body.id}`, { method: 'PATCH', cookie, body: { stock: 5 } }),
          api(`/api/colorants/${colorant.body.id}`, { method: 'DELETE', cookie }),
          api('/api/molds', { cookie, body: { name: unique('Not allowed'), bodyStyle: 'grub', cavities: 1, mlPerCavity: 3, thickness: 'thin' } }),
          api(`/api/molds/${mold.body.id}`, { method: 'PATCH', cookie, body: { cavities: 2 } }),
          api(`/api/molds/${mold.body.id}`, { method: 'DELETE', cookie }),
        ];
        for (const res of await Promise.all(writes)) {
          expect(res.status, role).toBe(403);
          expectErrorShape(res.body);
        }
      }
      expect((await api(`/api/colorants/${colorant.body.id}`, { method: 'PATCH', cookie: lead, body: { stock: 250 } })).body).toMatchObject({ stock: 250 });
      expect((await api('/api/colorants', { body: { name: 'x', kind: 'base', unit: 'ml' } })).status).toBe(401);
      expect((await api('/api/colorants', { cookie: lead, origin: 'http://evil.example', body: { name: unique('x'), kind: 'base', unit: 'ml' } })).status).toBe(403);
    } finally {
      // The lead's own entries leave the demo library again.
      expect((await api(`/api/colorants/${colorant.body.id}`, { method: 'DELETE', cookie: lead })).status).toBe(200);
      expect((await api(`/api/molds/${mold.body.id}`, { method: 'DELETE', cookie: lead })).status).toBe(200);
    }
  });
});
