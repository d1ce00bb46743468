// The next-pour suggestion's speed on a large shop: 5,000 pours of two zones each, of the
// simulated colorants (tests/color/sim), written straight into a fresh migrated SQLite file.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { newId } from '../lib/ids';
import { openDatabase } from '../db/open';
import { colorants, matches, photos, pours, recipeLines, samples, teams, zones } from '../db/schema';
import { fitColorantModel } from '../lib/color';
import { loadColorHistory } from '../db/queries/colorHistory';
import { suggestNextPour } from '../lib/matches/suggestNextPour';
import { COLORANTS, simHistory, trueLab } from '../tests/color/sim/shop';

const median = (v: number[]) => [...v].sort((a, b) => a - b)[Math.floor(v.length / 2)]!;
const time = (f: () => void) => {
  const t = performance.now();
  f();
  return performance.now() - t;
};
const timeAsync = async (f: () => Promise<unknown>) => {
  const t = performance.now();
  await f();
  return performance.now() - t;
};
const sequence = async (n: number, f: (k: number) => Promise<number>) => {
  const out: number[] = [];
  for (let k = 0; k < n; k++) out.push(await f(k));
  return out;
};

export async function runSuggestionBench(pourCount = 5000) {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'pourproof-bench-'));
  const database = openDatabase(path.join(dir, 'bench.db'), { migrate: true });
  try {
    const teamId = newId();
    const photoId = newId();
    const ids = COLORANTS.map(() => newId());
    const recipes = simHistory(pourCount * 2, 42);
    let lastPour = '';
    let lastMatch = '';
    database.transaction((tx) => {
      tx.insert(teams).values({ id: teamId, name: 'Bench shop' }).run();
      tx.insert(photos).values({ id: photoId, teamId, kind: 'pour', fileKey: `bench-${photoId}`, fileName: 'bench.jpg', mime: 'image/jpeg', size: 1, width: 1, height: 1 }).run();
      COLORANTS.forEach((c, i) => tx.insert(colorants).values({ id: ids[i]!, teamId, name: c.name, kind: c.kind, unit: c.unit }).run());
      for (let p = 0; p < pourCount; p++) {
        if (p % 5 === 0) {
          lastMatch = newId();
          tx.insert(matches).values({ id: lastMatch, teamId, name: `Bench match ${p / 5}`, tolerance: 2 }).run();
          const t = trueLab(recipes[p * 2]!);
          ['back', 'belly'].forEach((name, position) => tx.insert(zones).values({ id: newId(), matchId: lastMatch, name, position, targetL: t.l, targetA: t.a, targetB: t.b }).run());
        }
        lastPour = newId();
        tx.insert(pours).values({ id: lastPour, teamId, matchId: lastMatch, number: (p % 5) + 1, photoId }).run();
        ['back', 'belly'].forEach((zone, z) => {
          const doses = recipes[p * 2 + z]!;
          doses.forEach((d, i) => d > 0 && tx.insert(recipeLines).values({ id: newId(), pourId: lastPour, zone, colorantId: ids[i]!, amount: d, unit: 'drops' }).run());
          const lab = trueLab(doses);
          tx.insert(samples).values({ id: newId(), teamId, photoId, purpose: 'pour', matchId: lastMatch, pourId: lastPour, zone, shape: {}, l: lab.l, a: lab.a, b: lab.b, hex: '#000000', pixels: 1, kept: 1, spread: 0, glare: 0, flake: {}, dE00: 9 }).run();
        });
      }
    })
    const observations = loadColorHistory(database, teamId);
    const fullFit = time(() => fitColorantModel(observations));
    const first = await timeAsync(() => suggestNextPour(database, teamId, lastPour, 2));
    const cached = await sequence(30, () => timeAsync(() => suggestNextPour(database, teamId, lastPour, 2)));
    // A new pour logged in the last match, then its suggestion: the cached fit is kept (the
    // history grew by under 2 %), the match's own pours correct it.
    const afterNew = await sequence(10, (k) => {
      const id = newId();
      database.insert(pours).values({ id, teamId, matchId: lastMatch, number: 6 + k, photoId }).run();
      ['back', 'belly'].forEach((zone, z) => {
        const doses = recipes[z]!;
        doses.forEach((d, i) => d > 0 && database.insert(recipeLines).values({ id: newId(), pourId: id, zone, colorantId: ids[i]!, amount: d, unit: 'drops' }).run());
        const lab = trueLab(doses);
        database.insert(samples).values({ id: newId(), teamId, photoId, purpose: 'pour', matchId: lastMatch, pourId: id, zone, shape: {}, l: lab.l, a: lab.a, b: lab.b, hex: '#000000', pixels: 1, kept: 1, spread: 0, glare: 0, flake: {}, dE00: 9 }).run();
      });
      return timeAsync(() => suggestNextPour(database, teamId, id, 2));
    });
    return { pours: pourCount, colours: observations.length, fullFitMs: fullFit, firstMs: first, cachedMs: median(cached), afterNewPourMs: median(afterNew) };
  } finally {
    database.$client.close();
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

// Run on its own (`tsx --conditions=react-server bench/suggestion.ts`, so 'server-only' loads).
if (process.argv[1]?.endsWith('suggestion.ts')) {
  void runSuggestionBench().then((r) => {
    console.log(`  ${r.pours.toLocaleString('en')} pours, ${r.colours.toLocaleString('en')} logged colours in the shop`);
    console.log(`  suggestion, model cached:            ${r.cachedMs.toFixed(1)} ms (median of 30; target ≤ 30 ms)`);
    console.log(`  suggestion right after a new pour:   ${r.afterNewPourMs.toFixed(1)} ms (median of 10; cached fit kept below 2 % growth)`);
    console.log(`  first suggestion after a restart:    ${r.firstMs.toFixed(0)} ms (fits the model from scratch)`);
    console.log(`  full refit of the model alone:       ${r.fullFitMs.toFixed(0)} ms (once per 2 % growth of the history)`);
  });
}
