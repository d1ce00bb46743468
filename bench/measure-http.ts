// Bench: POST /api/measure over HTTP (multipart upload of the 12 MP JPEG, one region of a quarter
// of it, measured in the server's worker pool) against sharp's bare decode + extract of the same
// region in this process, interleaved so load on the machine hits both alike; 21 runs after 6 to
// warm the server (its worker thread compiles the measuring code on first use), median of each.
import sharp from 'sharp';
import { BENCH_BOX, BENCH_SHAPE, benchPhoto } from './measure';

export interface MeasureHttpResult {
  runs: number;
  bytes: number;
  /** Median ms from sending the upload to reading the whole answer. */
  httpMs: number;
  sharpMs: number;
  ratio: number;
  statuses: number[];
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[xs.length >> 1];

export async function runMeasureOverHttp(base: string, cookie: string, runs = 21, warmUp = 6): Promise<MeasureHttpResult> {
  const jpg = await benchPhoto();
  const regions = JSON.stringify([{ name: 'back', shape: BENCH_SHAPE }]);
  const upload = async () => {
    const form = new FormData();
    form.set('image', new Blob([new Uint8Array(jpg)], { type: 'image/jpeg' }), 'photo.jpg');
    form.set('regions', regions);
    const res = await fetch(`${base}/api/measure`, { method: 'POST', body: form, headers: { origin: base, cookie } });
    await res.arrayBuffer();
    return res.status;
  };
  const bare = () => sharp(jpg).extract(BENCH_BOX).raw().toBuffer();
  const http: number[] = [], alone: number[] = [], statuses = new Set<number>();
  for (let r = 0; r < warmUp + runs; r++) {
    let t = performance.now();
    statuses.add(await upload());
    if (r >= warmUp) http.push(performance.now() - t);
    t = performance.now();
    await bare();
    if (r >= warmUp) alone.push(performance.now() - t);
  }
  const httpMs = median(http), sharpMs = median(alone);
  return { runs, bytes: jpg.length, httpMs, sharpMs, ratio: httpMs / sharpMs, statuses: [...statuses] };
}
