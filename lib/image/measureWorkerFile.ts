import { workerFile } from '../workerFile';

/** Where scripts/build-worker.ts writes the measuring worker: beside the Next build it belongs to. */
export function measureWorkerFile(distDir?: string): string {
  return workerFile('measure', distDir);
}
