import { eq } from 'drizzle-orm';
import { hashPassword } from '../../lib/auth/password';
import { newId } from '../../lib/ids';
import { moveStock } from '../../lib/stock/moveStock';
import type { DB } from '../../db/open';
import { type Role, colorants, matches, memberships, molds, teams, users, zones } from '../../db/schema';

// An invented shop with invented people, colours and recipes: nothing here
// names a real brand, person or product.
export const DEMO_PASSWORD = 'pourproof-demo';
export const DEMO_TEAM = 'Marrowfield Soft Baits';
const PEOPLE: { email: string; name: string; role: Role }[] = [
  { email: 'owner@demo.test', name: 'Odile Brannock', role: 'owner' },
  { email: 'lead@demo.test', name: 'Lem Tashgar', role: 'lead' },
  { email: 'maker@demo.test', name: 'Mika Feldspar', role: 'maker' },
  { email: 'viewer@demo.test', name: 'Vesna Quill', role: 'viewer' },
];

type C = Omit<typeof colorants.$inferInsert, 'id' | 'teamId'>;
const COLORANTS: C[] = [
  { name: 'Base plastisol, medium', kind: 'base', unit: 'ml', costPerUnit: 0.009, stock: 7570 },
  { name: 'Base plastisol, soft', kind: 'base', unit: 'ml', costPerUnit: 0.01, stock: 3785 },
  { name: 'Pigment, reed green', kind: 'pigment', unit: 'drops', costPerUnit: 0.02, stock: 900 },
  { name: 'Pigment, brick red', kind: 'pigment', unit: 'drops', costPerUnit: 0.02, stock: 650 },
  { name: 'Pigment, char black', kind: 'pigment', unit: 'drops', costPerUnit: 0.02, stock: 1200 },
  { name: 'Pigment, chalk white', kind: 'pigment', unit: 'drops', costPerUnit: 0.02, stock: 800 },
  { name: 'Pigment, marsh brown', kind: 'pigment', unit: 'drops', costPerUnit: 0.02, stock: 500 },
  { name: 'Pigment, lamp blue', kind: 'pigment', unit: 'drops', costPerUnit: 0.02, stock: 420 },
  { name: 'Pearl, fine silver', kind: 'pearl', unit: 'tsp', costPerUnit: 0.35, stock: 60 },
  { name: 'Pearl, copper sheen', kind: 'pearl', unit: 'tsp', costPerUnit: 0.4, stock: 35 },
  { name: 'Flake, black 0.015 in', kind: 'flake', unit: 'tsp', costPerUnit: 0.3, stock: 40, flakeSizeIn: 0.015, flakeColor: 'black' },
  { name: 'Flake, gold 0.025 in', kind: 'flake', unit: 'tsp', costPerUnit: 0.3, stock: 28, flakeSizeIn: 0.025, flakeColor: 'gold' },
  { name: 'Flake, red 0.035 in', kind: 'flake', unit: 'tsp', costPerUnit: 0.3, stock: 22, flakeSizeIn: 0.035, flakeColor: 'red' },
  { name: 'Glow powder, green', kind: 'glow', unit: 'tsp', costPerUnit: 0.5, stock: 15 },
  { name: 'Softener', kind: 'additive', unit: 'ml', costPerUnit: 0.012, stock: 946 },
  { name: 'Fine salt', kind: 'additive', unit: 'tsp', costPerUnit: 0.01, stock: 400 },
];

type M = Omit<typeof molds.$inferInsert, 'id' | 'teamId'>;
const MOLDS: M[] = [
  { name: 'Stick worm 5 in, 4 cavity', bodyStyle: 'stick worm', lengthIn: 5, cavities: 4, mlPerCavity: 9.5, thickness: 'thick' },
  { name: 'Craw 3.5 in, 2 cavity', bodyStyle: 'craw', lengthIn: 3.5, cavities: 2, mlPerCavity: 7, thickness: 'standard' },
  { name: 'Finesse worm 4 in, 6 cavity', bodyStyle: 'finesse worm', lengthIn: 4, cavities: 6, mlPerCavity: 3.2, thickness: 'thin' },
  { name: 'Paddle swimbait 4.5 in, 2 cavity', bodyStyle: 'swimbait', lengthIn: 4.5, cavities: 2, mlPerCavity: 14, thickness: 'standard' },
];

const MATCHES = [
  { name: 'Dusk crawdad', zones: ['back', 'belly'], notes: 'Laminate: brown back over orange belly, black flake in the back.' },
  { name: 'Pond ghost', zones: ['back', 'belly'], notes: 'Translucent with silver pearl.' },
  { name: 'Cinder minnow', zones: ['back', 'belly', 'tail'], notes: null },
];

// Where the demo shop wants a reorder reminder, in each kind's usual unit.
const LOW_STOCK_AT: Record<string, number> = { base: 1900, pigment: 450, pearl: 10, flake: 8, glow: 5 };

export async function seedDemo(database: DB): Promise<boolean> {
  if (database.select({ id: teams.id }).from(teams).limit(1).get()) return false;
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const teamId = newId();
  database.transaction((tx) => {
    tx.insert(teams).values({ id: teamId, name: DEMO_TEAM }).run();
    const ids: Record<string, string> = {};
    for (const p of PEOPLE) {
      ids[p.role] = newId();
      tx.insert(users).values({ id: ids[p.role]!, email: p.email, name: p.name, passwordHash }).run();
      tx.insert(memberships).values({ id: newId(), teamId, userId: ids[p.role]!, role: p.role }).run();
    }
    for (const c of COLORANTS) {
      const id = newId();
      tx.insert(colorants).values({ id, teamId, ...c, stock: null, lowStockAt: LOW_STOCK_AT[c.kind] ?? null }).run();
      // Stock enters through the ledger, as a delivery.
      if (c.stock != null) moveStock(tx, { teamId, colorantId: id, kind: 'delivery', amount: c.stock, note: 'opening stock', createdBy: ids.owner ?? null });
    }
    for (const m of MOLDS) tx.insert(molds).values({ id: newId(), teamId, ...m }).run();
    MATCHES.forEach((m, i) => {
      const matchId = newId();
      const at = Date.now() - (MATCHES.length - i) * 3600_000;
      tx.insert(matches).values({ id: matchId, teamId, name: m.name, tolerance: 2.0, notes: m.notes, createdBy: ids.maker, createdAt: at, updatedAt: at }).run();
      // Targets come from reference photos: see seed-demo-pours.ts.
      m.zones.forEach((name, position) => tx.insert(zones).values({ id: newId(), matchId, name, position }).run());
    });
  });
  return true;
}

export function demoTeamId(database: DB): string | undefined {
  return database.select({ id: teams.id }).from(teams).where(eq(teams.name, DEMO_TEAM)).get()?.id;
}


