// The worker side of the measuring pool (lib/image/measurePool.ts): bundled on
// its own by scripts/build-worker.ts and run in worker threads by piscina, so
// decoding, the Lab conversion and the statistics never hold up the request
// thread. Errors a maker can act on travel back as data (classes do not cross
// threads); anything else rejects the task.
import sharp from 'sharp';
import { ImageError, type ImageErrorKind } from './imageError';
import { measurePhoto, type NeutralPatch, type PhotoMeasure, type PhotoRegion } from './measurePhoto';

// One libvips thread per worker: the pool already runs a worker per spare core.
sharp.concurrency(1);

export type MeasureTask = { bytes: Uint8Array; regions: PhotoRegion[]; neutral?: NeutralPatch };
export type MeasureReply = { ok: true; result: PhotoMeasure } | { ok: false; kind: ImageErrorKind; message: string };

export default async function measureTask(task: MeasureTask): Promise<MeasureReply> {
  try {
    const buf = Buffer.from(task.bytes.buffer, task.bytes.byteOffset, task.bytes.byteLength);
    return { ok: true, result: await measurePhoto(buf, task.regions, task.neutral) };
  } catch (err) {
    if (err instanceof ImageError) return { ok: false, kind: err.kind, message: err.message };
    throw err;
  }
}
