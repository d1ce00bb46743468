import 'server-only';
import fs from 'node:fs';
import Piscina from 'piscina';
import { fitColorantModel, type ColorantModel, type DoseObservation } from '@/lib/color';
import { workerFile } from '@/lib/workerFile';
import type { FitTask } from './fitWorker';

const g = globalThis as unknown as { pourproofFitPool?: Piscina<FitTask, ColorantModel | null> | null };

// One thread, started when first needed and let go when idle: refits are rare
// (a restart, or the history grew by a few per cent). Outside the app server
// (scripts, unit tests) or without the bundle, the fit runs in-process.
function pool(): Piscina<FitTask, ColorantModel | null> | null {
  if (g.pourproofFitPool !== undefined) return g.pourproofFitPool;
  const file = workerFile('fit');
  if (process.env.NEXT_RUNTIME !== 'nodejs' || !fs.existsSync(file)) {
    g.pourproofFitPool = null;
    return null;
  }
  g.pourproofFitPool = new Piscina<FitTask, ColorantModel | null>({ filename: file, minThreads: 0, maxThreads: 1, idleTimeout: 30_000 });
  return g.pourproofFitPool;
}

/** fitColorantModel off the request thread, with the same answer. */
export async function fitColorantModelOffThread(observations: DoseObservation[], previous: ColorantModel | null): Promise<ColorantModel | null> {
  const workers = pool();
  if (!workers) return fitColorantModel(observations, previous);
  return workers.run({ observations, previous });
}
