import path from 'node:path';
import { buildMeasureWorker } from './build-worker';
import { run } from './run';

// The production build: `next build`, then the measuring worker's bundle into
// the same folder (next build empties it first). Exit code 0 when both worked.
export async function buildApp(root: string, distDir = process.env.NEXT_DIST_DIR || '.next', extraEnv: Record<string, string> = {}): Promise<number> {
  const code = await run(path.join(root, 'node_modules/.bin/next'), ['build'], { NEXT_DIST_DIR: distDir, ...extraEnv });
  if (code !== 0) return code;
  await buildMeasureWorker(distDir);
  return 0;
}

if (require.main === module) {
  buildApp(path.resolve(__dirname, '..')).then((code) => process.exit(code), (err) => {
    console.error(err);
    process.exit(1);
  });
}
