import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { startUploadsFake, type UploadsFakeOptions } from '../../../uploads-fake/server';

// Starts the stand-in on a random port with a throw-away data directory and
// keeps its one-line-per-request log in memory instead of the console.
export async function startFakeForTest(options: UploadsFakeOptions = {}) {
  const dataDir = await mkdtemp(path.join(tmpdir(), 'pourproof-uploads-'));
  const log: string[] = [];
  const fake = await startUploadsFake({ port: 0, dataDir, log: (line) => log.push(line), ...options });
  return {
    fake,
    dataDir,
    log,
    storedNames: () => readdir(dataDir),
    stop: async () => {
      await fake.close();
      await rm(dataDir, { recursive: true, force: true });
    },
  };
}
