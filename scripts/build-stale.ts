import fs from 'node:fs';
import path from 'node:path';

const SOURCES = ['app', 'components', 'lib', 'db', 'proxy.ts', 'instrumentation.ts', 'next.config.mjs', 'tailwind.config.ts', 'package-lock.json'];

function newest(p: string): number {
  if (!fs.existsSync(p)) return 0;
  const st = fs.statSync(p);
  if (!st.isDirectory()) return st.mtimeMs;
  let m = 0;
  for (const e of fs.readdirSync(p)) m = Math.max(m, newest(path.join(p, e)));
  return m;
}

// True when there is no build in distDir, or a source file changed after it.
export function buildIsStale(root: string, distDir = '.next'): boolean {
  const id = path.join(root, distDir, 'BUILD_ID');
  if (!fs.existsSync(id) || !['measure', 'fit'].every((w) => fs.existsSync(path.join(root, distDir, 'workers', `${w}.mjs`)))) return true;
  const built = fs.statSync(id).mtimeMs;
  return SOURCES.some((s) => newest(path.join(root, s)) > built);
}
