import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

// STYLE.md: every server-only module starts with `import 'server-only'`, so a
// client component that imports one by mistake fails the build instead of
// shipping database or file-system code to the browser.
const ROOT = path.resolve(__dirname, '../..');

// Folders whose modules only ever run on the server.
const SERVER_FOLDERS = ['db/queries', 'lib/auth', 'lib/backup', 'lib/csv', 'lib/libraries', 'lib/mail', 'lib/matches', 'lib/signoff', 'lib/stock', 'lib/team'];
// Server modules elsewhere. Left out on purpose: lib/auth/sessionCookieName.ts,
// lib/http/sameOrigin.ts and lib/http/peerHeader.ts (loaded by proxy.ts and
// instrumentation.ts, outside the React Server environment), db/schema.ts
// (read by drizzle-kit), lib/image/measureWorker*.ts (the worker bundle and its path).
const SERVER_FILES = [
  'db/client.ts', 'db/open.ts', 'lib/appUrl.ts', 'lib/audit.ts', 'lib/http/action.ts', 'lib/http/api.ts',
  'lib/image/decodeImage.ts', 'lib/image/measurePhoto.ts', 'lib/image/measurePool.ts', 'lib/image/inspectImage.ts',
  'lib/uploads/savePhoto.ts', 'lib/uploads/inspectPhoto.ts', 'lib/batches/logBatch.ts', 'lib/batches/loadBatchSheet.ts',
];
// Types the client imports too (with import type): no code of their own.
const EXEMPT = new Set(['lib/auth/sessionCookieName.ts', 'lib/matches/suggestionTypes.ts']);

function serverModules(): string[] {
  const inFolders = SERVER_FOLDERS.flatMap((dir) =>
    fs.readdirSync(path.join(ROOT, dir))
      .filter((f) => f.endsWith('.ts') && !f.endsWith('.test.ts'))
      .map((f) => `${dir}/${f}`),
  );
  return [...inFolders, ...SERVER_FILES].filter((f) => !EXEMPT.has(f));
}

describe('server modules are marked server-only', () => {
  it('finds the modules it checks', () => {
    expect(serverModules().length).toBeGreaterThan(60);
  });

  it.each(serverModules())('%s starts with import \'server-only\'', (file) => {
    const first = fs.readFileSync(path.join(ROOT, file), 'utf8').split('\n').find((l) => l.trim() !== '' && !l.startsWith('//'));
    expect(first).toBe("import 'server-only';");
  });
});
