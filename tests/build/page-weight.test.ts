import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { isBuilt, ROOT, TEST_DIST_DIR } from '../support/app-process';

// What the production build makes a browser fetch at load for a route, read from the build's own
// manifests: the root main files every page loads (build-manifest.json) and the route's client
// entry chunks (its client reference manifest), each gzipped as `next start` sends it (zlib's
// default level 6, the `compression` middleware's default). Chunks loaded later through
// next/dynamic (the forms) are not in these lists. `npm run bench` measures the same thing in
// Chromium; this is the build-time guard.
const dist = path.join(ROOT, TEST_DIST_DIR);

function routeChunks(route: string): string[] {
  const build = JSON.parse(fs.readFileSync(path.join(dist, 'build-manifest.json'), 'utf8')) as { rootMainFiles: string[] };
  const file = path.join(dist, 'server', 'app', `${route}_client-reference-manifest.js`);
  const sandbox = { self: {} as Record<string, unknown>, globalThis: {} as Record<string, unknown> };
  new Function('self', 'globalThis', fs.readFileSync(file, 'utf8'))(sandbox.self, sandbox.globalThis);
  const manifests = (sandbox.globalThis.__RSC_MANIFEST ?? sandbox.self.__RSC_MANIFEST) as Record<string, { entryJSFiles: Record<string, string[]> }>;
  const entry = Object.values(manifests)[0]!.entryJSFiles;
  return [...new Set([...build.rootMainFiles, ...Object.values(entry).flat()])];
}
const gzipKB = (files: string[]) => files.reduce((sum, f) => sum + zlib.gzipSync(fs.readFileSync(path.join(dist, f)), { level: 6 }).length, 0) / 1000;
const holding = (files: string[], marker: string) => files.filter((f) => fs.readFileSync(path.join(dist, f), 'utf8').includes(marker));

// Signatures of libraries that should only arrive when a form is opened (strings in their code).
const ZOD = 'ZodRealError';
const UPLOAD_SDK = 'Micro.evaluate';
// A method name of TanStack Table's core (property names survive minification).
const TABLE_CORE = 'getToggleSortingHandler';

describe.skipIf(!isBuilt())('the JavaScript a route loads (issue 14)', () => {
  const match = routeChunks('(bench)/matches/[id]/page');
  const list = routeChunks('(bench)/matches/(list)/page');

  it('the match page stays within its goal of 200 kB, the forms out of it', () => {
    expect(match.length).toBeGreaterThan(4);
    expect(gzipKB(match)).toBeLessThanOrEqual(200);
    expect(holding(match, ZOD)).toEqual([]);
    expect(holding(match, UPLOAD_SDK)).toEqual([]);
  });

  it('the Matches list stays within its goal of 150 kB, with no schema library and no table code (the table is rendered on the server)', () => {
    expect(list.length).toBeGreaterThan(4);
    expect(gzipKB(list)).toBeLessThanOrEqual(150);
    expect(holding(list, TABLE_CORE)).toEqual([]);
    expect(holding(list, ZOD)).toEqual([]);
  });
});
