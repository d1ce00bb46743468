import path from 'node:path';
import { build } from 'esbuild';
import { measureWorkerFile } from '../lib/image/measureWorkerFile';

// Bundles the measuring worker (lib/image/measureWorker.ts) into the Next build
// folder it serves, after `next build` (which empties that folder). sharp stays
// a native module loaded from node_modules.
export async function buildMeasureWorker(distDir = process.env.NEXT_DIST_DIR || '.next') {
  const root = path.resolve(__dirname, '..');
  await build({
    entryPoints: [path.join(root, 'lib/image/measureWorker.ts')],
    outfile: measureWorkerFile(path.resolve(root, distDir)),
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
