import 'server-only';
import { colorHistoryKeysSince, colorHistoryStamp, loadColorHistory, loadFlakeHistory } from '@/db/queries/colorHistory';
import type { DB } from '@/db/open';
import { fitFlakeRate, type ColorantModel, type FlakeRate } from '@/lib/color';
import { fitColorantModelOffThread } from './fitPool';

export interface ShopModel {
  model: ColorantModel | null;
  /** Median dose per cup of each modelled colorant key in the shop's logged colours. */
  typical: Record<string, number>;
  /** Poisson coverage rate per flake colorant key (fitFlakeRate). */
  flake: Record<string, FlakeRate>;
  /** Logged colours the model was last fitted on. */
  fittedOn: number;
}

interface Entry extends ShopModel {
  stamp: string;
  keySet: Set<string>;
}

/** Refit in full once the history grew by this share since the last fit. */
const REFIT_GROWTH = 0.02;
const cache = new Map<string, Entry>();
/** A refit under way per team: requests that arrive meanwhile wait for the same one. */
const fitting = new Map<string, { stamp: string; entry: Promise<Entry> }>();

const median = (v: number[]) => {
  const s = [...v].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] ?? 0;
};

// The team's colorant model, cached per team in this process. A new logged colour changes the
// stamp; the cached fit is kept while the history grew by under REFIT_GROWTH and brought no new
// colorant (the match's own pours correct it locally meanwhile), else refitted, warm-started
// from the cached fit. The first request after a restart fits from scratch. The fit itself runs
// on a worker thread (fitPool), so the server keeps answering meanwhile.
export async function shopModel(database: DB, teamId: string): Promise<ShopModel> {
  const stamp = colorHistoryStamp(database, teamId);
  const hit = cache.get(teamId);
  if (hit && hit.stamp === stamp) return hit;
  const [count] = stamp.split(':').map(Number);
  if (hit && hit.model && count! >= hit.fittedOn && count! < hit.fittedOn * (1 + REFIT_GROWTH)) {
    // A colorant the fit has not seen yet needs a refit at once.
    // One second of margin: a pour's row and its samples are stamped a moment apart.
    const since = Number(hit.stamp.split(':')[1]) - 1000;
    if (colorHistoryKeysSince(database, teamId, since).every((k) => hit.keySet.has(k))) {
      hit.stamp = stamp;
      return hit;
    }
  }
  const running = fitting.get(teamId);
  if (running && running.stamp === stamp) return running.entry;
  const entry = fit(teamId, stamp, loadColorHistory(database, teamId), hit?.model ?? null, database);
  fitting.set(teamId, { stamp, entry });
  try {
    return await entry;
  } finally {
    if (fitting.get(teamId)?.entry === entry) fitting.delete(teamId);
  }
}

async function fit(teamId: string, stamp: string, observations: ReturnType<typeof loadColorHistory>, previous: ColorantModel | null, database: DB): Promise<Entry> {
  // The history is read now, on this thread; only the fit waits for the worker.
  const flakeHistory = loadFlakeHistory(database, teamId);
  const model = await fitColorantModelOffThread(observations, previous);
  const doses = new Map<string, number[]>();
  for (const o of observations) for (const [k, d] of Object.entries(o.doses)) doses.set(k, [...(doses.get(k) ?? []), d]);
  const typical = Object.fromEntries([...doses].map(([k, v]) => [k, median(v)]));
  const flake = Object.fromEntries(
    Object.entries(flakeHistory).flatMap(([k, obs]) => {
      const r = fitFlakeRate(obs);
      return r ? [[k, r]] : [];
    }),
  );
  const entry: Entry = { model, typical, flake, fittedOn: observations.length, stamp, keySet: new Set(doses.keys()) };
  // Two refits may overlap (the history moved on meanwhile): the one fitted on more colours stays.
  const held = cache.get(teamId);
  if (!held || held.fittedOn <= entry.fittedOn) cache.set(teamId, entry);
  return entry;
}
