import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { isBuilt, ROOT, TEST_DIST_DIR } from '../support/app-process';

// The browser gets no database code: no client chunk of the production build
// carries drizzle's table machinery (its entities are tagged with
// Symbol.for('drizzle:…')) or a table name of the schema.
function chunks(dir: string): string[] {
  if (!fs.existsSync(dir)) return [];
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    return e.isDirectory() ? chunks(p) : e.name.endsWith('.js') ? [p] : [];
  });
}

describe.skipIf(!isBuilt())('the client bundle', () => {
  it('holds no drizzle code and no table definitions', () => {
    const files = chunks(path.join(ROOT, TEST_DIST_DIR, 'static', 'chunks'));
    expect(files.length).toBeGreaterThan(5);
    const leaking = files.filter((f) => {
      const js = fs.readFileSync(f, 'utf8');
      return js.includes('drizzle:') || /sqliteTable|"sign_in_failures"|"outgoing_mail"/.test(js);
    });
    expect(leaking.map((f) => path.relative(ROOT, f))).toEqual([]);
  });
});
