import 'server-only';
import fs from 'node:fs';
import os from 'node:os';
import Piscina from 'piscina';
import { ImageError } from './imageError';
import { inspectImage } from './inspectImage';
import { measurePhoto, type NeutralPatch, type PhotoMeasure, type PhotoRegion } from './measurePhoto';
import type { MeasureReply, MeasureTask } from './measureWorker';
import { measureWorkerFile } from './measureWorkerFile';
import { assertWorkBudget } from './workBudget';

const g = globalThis as unknown as { pourproofMeasurePool?: Piscina<MeasureTask, MeasureReply> | null };

// One pool per server process: a thread per core but one, so the request
// thread keeps a core to answer everyone else while photos are measured (on a
// single core, one worker). Outside the app server
// (scripts, unit tests) or without the bundle, photos are measured in-process.
function pool(): Piscina<MeasureTask, MeasureReply> | null {
  if (g.pourproofMeasurePool !== undefined) return g.pourproofMeasurePool;
  const file = measureWorkerFile();
  if (process.env.NEXT_RUNTIME !== 'nodejs' || !fs.existsSync(file)) {
    if (process.env.NEXT_RUNTIME === 'nodejs') console.warn(`[measure] no worker bundle at ${file}: measuring on the request thread (run npm run build)`);
    g.pourproofMeasurePool = null;
    return null;
  }
  g.pourproofMeasurePool = new Piscina<MeasureTask, MeasureReply>({ filename: file, maxThreads: Math.max(1, os.availableParallelism() - 1), minThreads: 1, idleTimeout: 60_000 });
  return g.pourproofMeasurePool;
}

/**
 * measurePhoto off the request thread: the header and the work budget are
 * checked here first (cheap, before anything is decoded), then a worker thread
 * decodes and measures. Same answers and ImageErrors as measurePhoto.
 */
export async function measureOffThread(bytes: Buffer, regions: PhotoRegion[], neutral?: NeutralPatch): Promise<PhotoMeasure> {
  const header = await inspectImage(bytes);
  assertWorkBudget([...regions.map((r) => r.shape), ...(neutral ? [neutral.shape] : [])], header.width, header.height);
  const workers = pool();
  if (!workers) return measurePhoto(bytes, regions, neutral);
  // The bytes are moved to the worker, not copied: a copy of their own first,
  // since a Buffer may share its memory with Node's pool.
  const own = new Uint8Array(bytes.byteLength);
  own.set(bytes);
  const reply = await workers.run({ bytes: own, regions, neutral }, { transferList: [own.buffer] });
  if (!reply.ok) throw new ImageError(reply.kind, reply.message);
  return reply.result;
}
