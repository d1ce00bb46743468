// A large invented shop for the read figures of `npm run bench` and the query-plan test:
// 200 matches, 5,000 test pours, production batches of the approved ones and a photo for
// every reference, pour and batch, written with direct inserts in one transaction.
// Every name here is invented; the colours are made up, not measured.
import { eq } from 'drizzle-orm';
import type { SQLiteTable } from 'drizzle-orm/sqlite-core';
import { compareLab, labToHex } from '../lib/color';
import { hashPassword } from '../lib/auth/password';
import { newId } from '../lib/ids';
import type { DB } from '../db/open';
import {
  auditEvents, batches, colorants, matches, memberships, molds, photos, pours, recipeLines, samples, signOffs, teams, users, zones,
} from '../db/schema';
import { rng } from '../tests/color/synth';

export const LARGE_SHOP = {
  team: 'Quarrybend Lure Works',
  password: 'large-shop-bench',
  maker: 'maker@quarrybend.test',
  lead: 'lead@quarrybend.test',
};

export type LargeShop = { teamId: string; matchIds: string[]; pours: number; batches: number; photos: number };

const PEOPLE = [
  { email: 'owner@quarrybend.test', name: 'Ottilie Varrow', role: 'owner' },
  { email: LARGE_SHOP.lead, name: 'Lorcan Pethwick', role: 'lead' },
  { email: LARGE_SHOP.maker, name: 'Marit Sollenby', role: 'maker' },
  { email: 'viewer@quarrybend.test', name: 'Vance Ellory', role: 'viewer' },
] as const;

const COLORANTS = [
  ['Base, medium', 'base', 'ml'], ['Pigment, moss', 'pigment', 'drops'], ['Pigment, rust', 'pigment', 'drops'],
  ['Pigment, soot', 'pigment', 'drops'], ['Pigment, bone', 'pigment', 'drops'], ['Pigment, slate blue', 'pigment', 'drops'],
  ['Pigment, ochre', 'pigment', 'drops'], ['Pearl, frost', 'pearl', 'tsp'], ['Flake, ember 0.02 in', 'flake', 'tsp'],
] as const;
const MOLD_NAMES = ['Ribbon tail 6 in', 'Creature 4 in', 'Tube 3.5 in', 'Grub 3 in', 'Fluke 5 in', 'Shad 4 in'];
const WORDS = ['Ashen', 'Bramble', 'Cobble', 'Dapple', 'Ember', 'Fallow', 'Gloam', 'Hollow', 'Ironweed', 'Juniper'];
const THINGS = ['shad', 'craw', 'minnow', 'leech', 'sculpin', 'frog', 'goby', 'darter', 'nymph', 'perchling'];


const sampleCommon = { shape: { type: 'rect', x: 0.2, y: 0.3, w: 0.2, h: 0.1 }, pixels: 4000, kept: 3600, spread: 0.8, glare: 0.01, flake: { coverage: 0, groups: [] }, uncertainty: 0.6 };

/** Writes the large shop into `database` (migrated) and returns its team id and match ids. */
// `emailTag` writes a second shop beside the first (its people's e-mail addresses start with it).
export async function seedLargeShop(database: DB, opts: { matches?: number; pours?: number; emailTag?: string } = {}): Promise<LargeShop> {
  const matchCount = opts.matches ?? 200;
  const pourCount = opts.pours ?? 5000;
  const passwordHash = await hashPassword(LARGE_SHOP.password);
  const rand = rng(14);
  const teamId = newId();
  const matchIds: string[] = [];
  let batchCount = 0;
  let photoCount = 0;
  let poured = 0;
  const start = Date.now() - 365 * 86400_000;
  database.transaction((tx) => {
    tx.insert(teams).values({ id: teamId, name: opts.emailTag ? `${LARGE_SHOP.team} (${opts.emailTag})` : LARGE_SHOP.team }).run();
    const people: Record<string, string> = {};
    for (const p of PEOPLE) {
      people[p.role] = newId();
      tx.insert(users).values({ id: people[p.role]!, email: opts.emailTag ? `${opts.emailTag}-${p.email}` : p.email, name: p.name, passwordHash }).run();
      tx.insert(memberships).values({ id: newId(), teamId, userId: people[p.role]!, role: p.role }).run();
    }
    const colorantIds = COLORANTS.map(([name, kind, unit]) => {
      const id = newId();
      tx.insert(colorants).values({ id, teamId, name, kind, unit }).run();
      return { id, kind, unit };
    });
    const moldIds = MOLD_NAMES.map((name, i) => {
      const id = newId();
      tx.insert(molds).values({ id, teamId, name, bodyStyle: name.split(' ')[0]!.toLowerCase(), cavities: 2 + (i % 4), mlPerCavity: 4 + i, thickness: (['thin', 'standard', 'thick'] as const)[i % 3] }).run();
      return id;
    });
    const rows = {
      photos: [] as (typeof photos.$inferInsert)[],
      matches: [] as (typeof matches.$inferInsert)[],
      zones: [] as (typeof zones.$inferInsert)[],
      pours: [] as (typeof pours.$inferInsert)[],
      recipeLines: [] as (typeof recipeLines.$inferInsert)[],
      batches: [] as (typeof batches.$inferInsert)[],
      samples: [] as (typeof samples.$inferInsert)[],
      auditEvents: [] as (typeof auditEvents.$inferInsert)[],
      signOffs: [] as (typeof signOffs.$inferInsert)[],
    };
    const standards: [string, string][] = [];
    const photo = (kind: 'reference' | 'pour' | 'batch', at: number) => {
      const id = newId();
      photoCount++;
      rows.photos.push({ id, teamId, kind, fileKey: `large-${id}`, fileName: `${kind}-${photoCount}.jpg`, mime: 'image/jpeg', size: 250_000, width: 1600, height: 1200, uploadedBy: people.maker, createdAt: at });
      return id;
    };
    for (let m = 0; m < matchCount; m++) {
      // Pours spread unevenly over matches (between about half and one and a half times the mean).
      const share = Math.floor(pourCount / matchCount);
      const n = m === matchCount - 1 ? pourCount - poured : Math.max(1, share + ((m % 5) - 2) * Math.floor(share / 3));
      poured += n;
      const matchId = newId();
      matchIds.push(matchId);
      const created = start + Math.floor((m / matchCount) * 300 * 86400_000);
      const zoneNames = m % 3 === 0 ? ['back', 'belly', 'tail'] : ['back', 'belly'];
      const status = m % 10 === 0 ? 'archived' : m % 4 === 0 ? 'approved' : m % 7 === 0 ? 'in_review' : 'open';
      const name = `${WORDS[m % WORDS.length]} ${THINGS[Math.floor(m / WORDS.length) % THINGS.length]} ${Math.floor(m / 100) + 1}`;
      const matchRow: typeof matches.$inferInsert = { id: matchId, teamId, name, status, tolerance: 2, notes: m % 5 === 0 ? 'Laminate: darker back over a pale belly.' : null, createdBy: people.maker, createdAt: created, updatedAt: created };
      rows.matches.push(matchRow);
      const targets = zoneNames.map((z, position) => {
        const lab = { l: 30 + rand() * 50, a: -30 + rand() * 60, b: -30 + rand() * 70 };
        rows.zones.push({ id: newId(), matchId, name: z, position, targetL: lab.l, targetA: lab.a, targetB: lab.b, targetSpread: 0 });
        return { zone: z, lab };
      });
      const refPhoto = photo('reference', created);
      for (const t of targets) {
        rows.samples.push({ id: newId(), teamId, photoId: refPhoto, purpose: 'target', matchId, zone: t.zone, l: t.lab.l, a: t.lab.a, b: t.lab.b, hex: labToHex(t.lab), ...sampleCommon, createdAt: created });
      }
      let lastPour = '';
      let at = created;
      for (let p = 1; p <= n; p++) {
        at += 3600_000 + Math.floor(rand() * 86400_000);
        lastPour = newId();
        const pourPhoto = photo('pour', at);
        rows.pours.push({ id: lastPour, teamId, matchId, number: p, photoId: pourPhoto, moldId: moldIds[p % moldIds.length], batchCups: 1, tempF: 340, createdBy: people.maker, createdAt: at });
        // The pours close in on the target: off by several ΔE00 at first, about one at the end.
        const off = 12 * (1 - p / (n + 1)) + 1;
        targets.forEach((t, zi) => {
          for (let k = 0; k < 3; k++) {
            const c = colorantIds[1 + ((m + zi + k) % 6)]!;
            rows.recipeLines.push({ id: newId(), pourId: lastPour, zone: t.zone, colorantId: c.id, amount: 1 + Math.round(rand() * 12) / 2, unit: c.unit, position: zi * 3 + k });
          }
          const lab = { l: t.lab.l + (rand() - 0.5) * off, a: t.lab.a + (rand() - 0.5) * off, b: t.lab.b + (rand() - 0.5) * off };
          const cmp = compareLab(t.lab, lab, 2);
          rows.samples.push({ id: newId(), teamId, photoId: pourPhoto, purpose: 'pour', matchId, pourId: lastPour, zone: t.zone, l: lab.l, a: lab.a, b: lab.b, hex: labToHex(lab), ...sampleCommon, dE00: cmp.dE00, dL: cmp.dL, dC: cmp.dC, dH: cmp.dH, dE00Uncertainty: 0.9, createdAt: at });
        });
        rows.auditEvents.push({ id: newId(), teamId, actorId: people.maker, action: 'pour.created', entity: 'pour', entityId: lastPour, data: { matchId, number: p }, createdAt: at });
      }
      if (status === 'approved' && lastPour) {
        at += 3600_000;
        rows.auditEvents.push({ id: newId(), teamId, actorId: people.maker, action: 'pour.submitted', entity: 'pour', entityId: lastPour, data: { note: null }, createdAt: at });
        rows.signOffs.push({ id: newId(), teamId, matchId, pourId: lastPour, decision: 'approved', decidedBy: people.lead, createdAt: at + 60_000 });
        standards.push([matchId, lastPour]);
        matchRow.updatedAt = at + 60_000;
        // About a batch for every two pours of an approved match.
        for (let b = 0; b < Math.ceil(n / 2); b++) {
          at += 86400_000;
          const batchId = newId();
          const batchPhoto = photo('batch', at);
          rows.batches.push({ id: batchId, teamId, matchId, standardPourId: lastPour, photoId: batchPhoto, moldId: moldIds[b % moldIds.length], cups: 4, baitsExpected: 40, pass: true, createdBy: people.maker, createdAt: at });
          batchCount++;
          for (const t of targets) {
            const lab = { l: t.lab.l + rand() - 0.5, a: t.lab.a + rand() - 0.5, b: t.lab.b + rand() - 0.5 };
            const cmp = compareLab(t.lab, lab, 2);
            rows.samples.push({ id: newId(), teamId, photoId: batchPhoto, purpose: 'batch', matchId, batchId, zone: t.zone, l: lab.l, a: lab.a, b: lab.b, hex: labToHex(lab), ...sampleCommon, dE00: cmp.dE00, dL: cmp.dL, dC: cmp.dC, dH: cmp.dH, dE00Uncertainty: 0.9, createdAt: at });
          }
        }
      } else if (lastPour) {
        matchRow.updatedAt = at;
      }
    }
    // Parents first (foreign keys hold at every statement), a few hundred rows per statement.
    const write = <T extends SQLiteTable>(table: T, list: T['$inferInsert'][]) => {
      for (let i = 0; i < list.length; i += 200) tx.insert(table).values(list.slice(i, i + 200)).run();
    };
    write(photos, rows.photos);
    write(matches, rows.matches);
    write(zones, rows.zones);
    write(pours, rows.pours);
    write(recipeLines, rows.recipeLines);
    write(batches, rows.batches);
    write(samples, rows.samples);
    write(auditEvents, rows.auditEvents);
    write(signOffs, rows.signOffs);
    for (const [matchId, pourId] of standards) tx.update(matches).set({ standardPourId: pourId }).where(eq(matches.id, matchId)).run();
  });
  return { teamId, matchIds, pours: pourCount, batches: batchCount, photos: photoCount };
}
