import Database from 'better-sqlite3';
import { describe, expect, inject, it } from 'vitest';
import { api, baseUrl, signUpShop } from '../support/http';

// Server actions are posted as a browser without JavaScript posts them: the
// page's form fields, including React's hidden action fields. The shop
// settings action stands for all (role change, removal and invitation
// acceptance go through the same door, lib/http/action.ts).

function decode(v: string) {
  return v.replace(/&quot;/g, '"').replace(/&amp;/g, '&').replace(/&#x27;/g, "'").replace(/&lt;/g, '<').replace(/&gt;/g, '>');
}

async function settingsForm(cookie: string): Promise<FormData> {
  const page = await api<string>('/team', { cookie });
  expect(page.status).toBe(200);
  const form = /<form[^>]*aria-label="Team settings"[^>]*>([\s\S]*?)<\/form>/.exec(page.body)?.[1];
  expect(form, 'the settings form').toBeTruthy();
  const fd = new FormData();
  for (const m of form!.matchAll(/<input[^>]*type="hidden"[^>]*name="([^"]+)"(?:[^>]*value="([^"]*)")?[^>]*>/g)) fd.append(decode(m[1]!), decode(m[2] ?? ''));
  fd.append('defaultTolerance', '2.5');
  fd.append('dropsPerMl', '20');
  fd.append('sprueAllowanceMl', '3');
  fd.append('volumeUnit', 'cups');
  return fd;
}

const post = (cookie: string, body: FormData, origin: string | null) =>
  fetch(`${baseUrl()}/team`, { method: 'POST', headers: { cookie, ...(origin ? { origin } : {}) }, body, redirect: 'manual' });

function tolerance(teamId: string): number {
  const raw = new Database(inject('dbFile'), { readonly: true });
  const row = raw.prepare('select default_tolerance as t from teams where id = ?').get(teamId) as { t: number };
  raw.close();
  return row.t;
}

describe('server actions refuse like the API does', () => {
  it('refuses a missing or foreign Origin with 403 and changes nothing', async () => {
    const shop = await signUpShop('Action origin shop');
    const before = tolerance(shop.body.team.id);
    for (const origin of [null, 'http://evil.example']) {
      const res = await post(shop.cookie, await settingsForm(shop.cookie), origin);
      expect(res.status, String(origin)).toBe(403);
      expect(((await res.json()) as { error: { code: string } }).error.code).toBe('bad_origin');
    }
    expect(tolerance(shop.body.team.id)).toBe(before);
    // Control: the same form from the app's own origin is saved.
    const ok = await post(shop.cookie, await settingsForm(shop.cookie), baseUrl());
    expect(ok.status).toBeLessThan(400);
    expect(tolerance(shop.body.team.id)).toBeCloseTo(2.5, 9);
  });
  // A refused role as the page shows it: tests/e2e/team-settings.test.ts.
});
