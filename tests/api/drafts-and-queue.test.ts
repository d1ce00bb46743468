import { beforeAll, describe, expect, it } from 'vitest';
import { api, expectErrorShape, signInAs, signUpShop } from '../support/http';
import { BACK_SHAPE, BELLY_SHAPE, labToRgb8, twoTonePng, uploadPhoto } from '../support/photos';

const TARGET = { back: labToRgb8({ l: 38, a: 10, b: 22 }), belly: labToRgb8({ l: 62, a: 12, b: 30 }) };
const ZONES = [{ name: 'back', shape: BACK_SHAPE }, { name: 'belly', shape: BELLY_SHAPE }];
const uniq = () => `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;

describe('draft reference photos and the lead’s queue', () => {
  let maker: string;
  let lead: string;
  let viewer: string;
  beforeAll(async () => {
    maker = await signInAs('maker@demo.test', 'pourproof-demo', '10.74.0.1');
    lead = await signInAs('lead@demo.test', 'pourproof-demo', '10.74.0.2');
    viewer = await signInAs('viewer@demo.test', 'pourproof-demo', '10.74.0.3');
  });

  it('keeps an uploaded reference with its match until the target is measured, and links it on Photos', async () => {
    const name = `Draft ${uniq()}`;
    const matchId = (await api('/api/matches', { cookie: maker, body: { name, zones: ['back', 'belly'] } })).body.id as string;
    const photo = await uploadPhoto(maker, await twoTonePng(TARGET.back, TARGET.belly), 'reference');
    expect((await api(`/api/matches/${matchId}`, { cookie: maker })).body.draft).toBeNull();

    const attached = await api(`/api/matches/${matchId}/draft-photo`, { cookie: maker, body: { photoId: photo.id } });
    expect(attached.status).toBe(200);
    expect(attached.body.draft).toEqual({ photoId: photo.id, width: photo.width, height: photo.height });
    // A fresh read (a reload) still has it.
    expect((await api(`/api/matches/${matchId}`, { cookie: viewer })).body.draft.photoId).toBe(photo.id);
    const listed = ((await api('/api/photos', { cookie: viewer })).body as any[]).find((p) => p.id === photo.id);
    expect(listed.match).toEqual({ id: matchId, name, status: 'open', use: 'draft' });

    // Viewers may not attach; ids of another team or nonsense are refused; nothing changes.
    expect((await api(`/api/matches/${matchId}/draft-photo`, { cookie: viewer, body: { photoId: photo.id } })).status).toBe(403);
    const stranger = await signUpShop('Draft stranger');
    const theirs = await uploadPhoto(stranger.cookie, await twoTonePng(TARGET.back, TARGET.belly), 'reference');
    const foreign = await api(`/api/matches/${matchId}/draft-photo`, { cookie: maker, body: { photoId: theirs.id } });
    expect(foreign.status).toBe(400);
    expectErrorShape(foreign.body);
    expect(foreign.body.error.message).toMatch(/^photoId: no such photo/);
    expect((await api(`/api/matches/${matchId}/draft-photo`, { cookie: stranger.cookie, body: { photoId: theirs.id } })).status).toBe(404);
    expect((await api(`/api/matches/${matchId}/draft-photo`, { cookie: maker, body: {} })).status).toBe(400);

    // Measuring the target from it clears the draft; the photo is now the match's reference.
    expect((await api(`/api/matches/${matchId}/target`, { cookie: maker, body: { photoId: photo.id, zones: ZONES } })).status).toBe(200);
    expect((await api(`/api/matches/${matchId}`, { cookie: maker })).body.draft).toBeNull();
    const after = ((await api('/api/photos', { cookie: maker })).body as any[]).find((p) => p.id === photo.id);
    expect(after.match).toMatchObject({ id: matchId, use: 'target' });

    // Letting a draft go keeps the photo.
    const other = await uploadPhoto(maker, await twoTonePng(TARGET.back, TARGET.belly), 'reference');
    expect((await api(`/api/matches/${matchId}/draft-photo`, { cookie: maker, body: { photoId: other.id } })).status).toBe(200);
    const released = await api(`/api/matches/${matchId}/draft-photo`, { cookie: maker, method: 'DELETE' });
    expect(released.status).toBe(200);
    expect(released.body.draft).toBeNull();
    expect(((await api('/api/photos', { cookie: maker })).body as any[]).some((p) => p.id === other.id)).toBe(true);
  });

  it('lists pours waiting for sign-off with ΔE00 per zone, and drops them once decided', async () => {
    const name = `Queue ${uniq()}`;
    const matchId = (await api('/api/matches', { cookie: maker, body: { name, zones: ['back', 'belly'] } })).body.id as string;
    const ref = await uploadPhoto(maker, await twoTonePng(TARGET.back, TARGET.belly), 'reference');
    expect((await api(`/api/matches/${matchId}/target`, { cookie: maker, body: { photoId: ref.id, zones: ZONES } })).status).toBe(200);
    const pigment = ((await api('/api/colorants', { cookie: maker })).body as any[]).find((c) => c.unit === 'drops');
    const photo = await uploadPhoto(maker, await twoTonePng(TARGET.back, TARGET.belly), 'pour');
    const pour = await api(`/api/matches/${matchId}/pours`, { cookie: maker, body: { photoId: photo.id, recipe: [{ zone: 'back', colorantId: pigment.id, amount: 3, unit: 'drops' }], zones: ZONES } });
    expect(pour.status).toBe(201);
    const before = (await api('/api/sign-off-queue', { cookie: lead })).body as any[];
    expect(before.some((q) => q.pourId === pour.body.id)).toBe(false);
    expect((await api(`/api/pours/${pour.body.id}/submit`, { cookie: maker, body: {} })).status).toBe(200);

    const queue = await api('/api/sign-off-queue', { cookie: lead });
    expect(queue.status).toBe(200);
    const item = (queue.body as any[]).find((q) => q.pourId === pour.body.id);
    expect(item).toMatchObject({ matchId, matchName: name, number: 1, tolerance: 2, submittedBy: 'Mika Feldspar' });
    expect(item.zones.map((z: any) => z.name)).toEqual(['back', 'belly']);
    // Same pixels as the target: ΔE00 within measuring noise.
    for (const z of item.zones) expect(z.dE00).toBeLessThan(0.5);
    expect((await api('/api/sign-off-queue', { cookie: (await signUpShop('Queue stranger')).cookie })).body).toEqual([]);

    expect((await api(`/api/pours/${pour.body.id}/sign-off`, { cookie: lead, body: { decision: 'approved' } })).status).toBe(200);
    expect(((await api('/api/sign-off-queue', { cookie: lead })).body as any[]).some((q) => q.pourId === pour.body.id)).toBe(false);
  });
});
