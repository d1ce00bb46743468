import path from 'node:path';

/** Where scripts/build-worker.ts writes the measuring worker: beside the Next build it belongs to. */
export function measureWorkerFile(distDir = process.env.NEXT_DIST_DIR || '.next'): string {
  return path.resolve(distDir, 'workers', 'measure.mjs');
}
