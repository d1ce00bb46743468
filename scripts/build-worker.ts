import path from 'node:path';
import { build } from 'esbuild';
import { WORKERS, workerFile } from '../lib/workerFile';

// Bundles the worker threads (the measuring worker, lib/image/measureWorker.ts,
// and the model-fitting worker, lib/matches/fitWorker.ts) into the Next build
// folder they serve, after `next build` (which empties that folder). sharp stays
// a native module loaded from node_modules.
export async function buildMeasureWorker(distDir = process.env.NEXT_DIST_DIR || '.next') {
  const root = path.resolve(__dirname, '..');
  const dist = path.resolve(root, distDir);
  await build({
    entryPoints: Object.fromEntries(Object.entries(WORKERS).map(([name, file]) => [name, path.join(root, file)])),
    outdir: path.dirname(workerFile('measure', dist)),
    outExtension: { '.js': '.mjs' },
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    external: ['sharp'],
    // 'server-only' resolves to its empty module under the react-server condition.
    conditions: ['react-server'],
    tsconfig: path.join(root, 'tsconfig.json'),
    // CommonJS dependencies inside an ES module bundle still call require().
    banner: { js: "import { createRequire as __pourproofRequire } from 'node:module'; const require = __pourproofRequire(import.meta.url);" },
    logLevel: 'warning',
  });
}

if (require.main === module) {
  buildMeasureWorker().catch((err) => {
    console.error(err);
    process.exit(1);
  });
}
