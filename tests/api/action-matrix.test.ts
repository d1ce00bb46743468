import fs from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { openDatabase } from '../../db/open';
import { acceptInvitation } from '../../lib/team/invitations';
import { waitForMail } from '../support/mail';
import { api, baseUrl, signInAs, signUpShop, uniqueEmail } from '../support/http';
import { ACTIONS } from './access-manifest';

// The server actions of the manifest × six principals, posted as a browser
// without JavaScript posts a form (the page's hidden action fields). Only an
// owner changes anything; everyone else is refused without a 500 and without a
// trace in the database.

const PRINCIPALS = ['anonymous', 'viewer', 'maker', 'lead', 'owner', 'foreign'] as const;
type Principal = (typeof PRINCIPALS)[number];

const decode = (v: string) => v.replace(/&quot;/g, '"').replace(/&amp;/g, '&').replace(/&#x27;/g, "'").replace(/&lt;/g, '<').replace(/&gt;/g, '>');

// Each form of a page as its hidden fields plus the names of its other fields.
function formsOf(html: string): { hidden: [string, string][]; fields: string[]; text: string }[] {
  return [...html.matchAll(/<form[^>]*>([\s\S]*?)<\/form>/g)].map((m) => ({
    hidden: [...m[1]!.matchAll(/<input[^>]*type="hidden"[^>]*name="([^"]+)"(?:[^>]*value="([^"]*)")?[^>]*>/g)].map((h) => [decode(h[1]!), decode(h[2] ?? '')] as [string, string]),
    fields: [...m[0].matchAll(/name="([^"$]+)"/g)].map((f) => f[1]!),
    text: m[0],
  }));
}

function actionsInTree(): string[] {
  const root = path.resolve(__dirname, '../../app');
  const walk = (dir: string): string[] =>
    fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? walk(path.join(dir, e.name)) : e.name.endsWith('.ts') ? [path.join(dir, e.name)] : []));
  return walk(root)
    .filter((f) => /^['"]use server['"]/.test(fs.readFileSync(f, 'utf8')))
    .flatMap((f) => [...fs.readFileSync(f, 'utf8').matchAll(/export async function (\w+)/g)].map((m) => m[1]!));
}

describe('the server-action matrix', () => {
  const cookies: Partial<Record<Principal, string>> = {};
  let demoTeam = '';
  let targetUserId = '';
  let settingsHidden: [string, string][] = [];
  let roleHidden: [string, string][] = [];
  let removeHidden: [string, string][] = [];
  const db = () => new Database(inject('dbFile'), { readonly: true });

  beforeAll(async () => {
    for (const role of ['viewer', 'maker', 'lead', 'owner'] as const) cookies[role] = await signInAs(`${role}@demo.test`, 'pourproof-demo', '10.69.0.1');
    cookies.foreign = (await signUpShop('Action matrix stranger')).cookie;
    // A member of the demo shop of its own, for the role and removal actions.
    const email = uniqueEmail('matrix-member');
    expect((await api('/api/team/invitations', { body: { email, role: 'viewer' }, cookie: cookies.owner })).status).toBe(201);
    const token = (await waitForMail(email)).text.match(/\/invite\/([0-9a-f]{40})/)![1]!;
    const database = openDatabase(inject('dbFile'));
    const accepted = await acceptInvitation(database, token, { name: 'Matrix Member', password: 'matrix password 1' });
    database.$client.close();
    targetUserId = accepted.userId;
    demoTeam = accepted.teamId;
    const forms = formsOf((await api<string>('/team', { cookie: cookies.owner })).body);
    settingsHidden = forms.find((f) => f.text.includes('aria-label="Team settings"'))!.hidden;
    const rows = forms.filter((f) => f.hidden.some(([k, v]) => k === 'userId' && v === targetUserId));
    roleHidden = rows.find((f) => f.fields.includes('role'))!.hidden;
    removeHidden = rows.find((f) => !f.fields.includes('role'))!.hidden;
  });

  it('lists every server action of the app', () => {
    expect(actionsInTree().sort()).toEqual(ACTIONS.map((a) => a.action).sort());
  });

  const post = async (who: Principal, pagePath: string, hidden: [string, string][], fields: Record<string, string>) => {
    const fd = new FormData();
    for (const [k, v] of hidden) fd.append(k, v);
    for (const [k, v] of Object.entries(fields)) fd.append(k, v);
    const headers: Record<string, string> = { origin: baseUrl() };
    if (who !== 'anonymous') headers.cookie = cookies[who]!;
    return fetch(`${baseUrl()}${pagePath}`, { method: 'POST', headers, body: fd, redirect: 'manual' });
  };
  const settingsRow = () => {
    const raw = db();
    const row = raw.prepare('select default_tolerance as t, drops_per_ml as d, sprue_allowance_ml as s, volume_unit as u from teams where id = ?').get(demoTeam) as { t: number; d: number; s: number; u: string };
    raw.close();
    return row;
  };
  const tolerance = () => settingsRow().t;
  const targetRole = () => {
    const raw = db();
    const row = raw.prepare('select role from memberships where user_id = ?').get(targetUserId) as { role: string } | undefined;
    raw.close();
    return row?.role ?? null;
  };

  for (const who of PRINCIPALS) {
    it(`saveTeamSettings, changeRoleAction and removeMemberAction as ${who}`, async () => {
      const owner = who === 'owner';
      const saved = settingsRow();
      const before = saved.t;
      const form = (t: number) => ({ defaultTolerance: String(t), dropsPerMl: String(saved.d), sprueAllowanceMl: String(saved.s), volumeUnit: saved.u });
      const settings = await post(who, '/team', settingsHidden, form(before + 0.5));
      expect(settings.status).toBeLessThan(500);
      if (who === 'anonymous') expect(settings.status).toBe(307);
      expect(tolerance()).toBeCloseTo(owner ? before + 0.5 : before, 9);
      if (owner) await post(who, '/team', settingsHidden, form(before));

      const role = await post(who, '/team', roleHidden, { userId: targetUserId, role: 'lead' });
      expect(role.status).toBeLessThan(500);
      expect(targetRole()).toBe(owner ? 'lead' : 'viewer');
      if (owner) await post(who, '/team', roleHidden, { userId: targetUserId, role: 'viewer' });

      // The owner's removal comes last of all (see below).
      if (owner) return;
      const removal = await post(who, '/team', removeHidden, { userId: targetUserId });
      expect(removal.status).toBeLessThan(500);
      expect(targetRole()).toBe('viewer');
    });
  }

  it('removeMemberAction as the owner removes the member', async () => {
    const removal = await post('owner', '/team', removeHidden, { userId: targetUserId });
    expect(removal.status).toBeLessThan(500);
    expect(targetRole()).toBeNull();
  });

  it('acceptInvitationAction is public and refuses a bad form with its own message', async () => {
    const email = uniqueEmail('matrix-invitee');
    expect((await api('/api/team/invitations', { body: { email, role: 'maker' }, cookie: cookies.owner })).status).toBe(201);
    const token = (await waitForMail(email)).text.match(/\/invite\/([0-9a-f]{40})/)![1]!;
    const page = await api<string>(`/invite/${token}`);
    const form = formsOf(page.body).find((f) => f.fields.includes('password'))!;
    for (const who of PRINCIPALS) {
      const res = await post(who, `/invite/${token}`, form.hidden, { name: 'X', password: 'short' });
      expect(res.status, who).toBe(200);
      expect(await res.text()).toMatch(/at least/);
    }
    const raw = db();
    expect(raw.prepare('select count(*) as n from users where email = ?').get(email)).toEqual({ n: 0 });
    raw.close();
  });
});
