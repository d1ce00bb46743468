import { describe, expect, it } from 'vitest';
import { api, expectErrorShape, signInAs, signUpShop } from '../support/http';

// GET /api/team/export (API.md, "Owner's tools"): everything the shop owns,
// for its owner only, without secrets, and nothing of another shop.
describe('the owner export', () => {
  it("gives the owner every table of the shop's data, with photo URLs and no secrets", async () => {
    const owner = await signInAs('owner@demo.test', 'pourproof-demo', '10.67.0.1');
    const res = await api('/api/team/export', { cookie: owner });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-disposition')).toMatch(/attachment; filename="pourproof-export-\d{4}-\d{2}-\d{2}\.json"/);
    const body = res.body;
    expect(body.format).toBe('pourproof-team-export');
    // Other tests invite members to the demo shop meanwhile: the four demo accounts at least.
    expect(body.members.map((m: { email: string }) => m.email)).toEqual(expect.arrayContaining(['lead@demo.test', 'maker@demo.test', 'owner@demo.test', 'viewer@demo.test']));
    for (const table of ['colorants', 'molds', 'matches', 'zones', 'pours', 'recipe_lines', 'samples', 'sign_offs', 'batches', 'photos']) {
      expect(Array.isArray(body[table]), table).toBe(true);
      expect(body[table].length, table).toBeGreaterThan(0);
    }
    const text = JSON.stringify(body);
    expect(text).not.toMatch(/passwordHash|tokenHash|fileKey|\$argon2/);
    // Every match's standard, pour and batch belongs to the exported matches.
    const matchIds = new Set(body.matches.map((m: { id: string }) => m.id));
    expect(body.pours.every((p: { matchId: string }) => matchIds.has(p.matchId))).toBe(true);
    // A photo's URL serves its image to the team.
    const photo = body.photos[0];
    const img = await fetch(photo.imageUrl, { headers: { cookie: owner } });
    expect(img.status).toBe(200);
    expect(img.headers.get('content-type')).toMatch(/^image\//);
  });

  it("holds nothing of another shop's", async () => {
    const stranger = await signUpShop('Export stranger');
    const res = await api('/api/team/export', { cookie: stranger.cookie });
    expect(res.status).toBe(200);
    expect(res.body.members).toHaveLength(1);
    expect(res.body.matches).toEqual([]);
    expect(res.body.pours).toEqual([]);
    expect(res.body.photos).toEqual([]);
  });

  it.each(['lead', 'maker', 'viewer'])('refuses a %s with 403', async (role) => {
    const cookie = await signInAs(`${role}@demo.test`, 'pourproof-demo', '10.67.0.2');
    const res = await api('/api/team/export', { cookie });
    expect(res.status).toBe(403);
    expectErrorShape(res.body);
  });
});
