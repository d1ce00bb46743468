import path from 'node:path';

/** The worker bundles scripts/build-worker.ts writes beside the Next build they belong to. */
export const WORKERS = { measure: 'lib/image/measureWorker.ts', fit: 'lib/matches/fitWorker.ts' } as const;

export function workerFile(name: keyof typeof WORKERS, distDir = process.env.NEXT_DIST_DIR || '.next'): string {
  return path.resolve(distDir, 'workers', `${name}.mjs`);
}
