import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { isBuilt } from '../support/app-process';
import { crashOnce, drillDir } from '../support/drills';

// The short crash drill (the long one is `npm run crashtest`): writes under
// load, SIGKILL of the server, restart on the same SQLite file. Every write the
// server acknowledged is there, and the file passes integrity_check.
describe.skipIf(!isBuilt())('crash drill (short)', () => {
  it('keeps every acknowledged write through two kill -9 restarts', async () => {
    const dir = drillDir('pourproof-crash-');
    const dbFile = path.join(dir, 'app.db');
    try {
      let total = 0;
      for (let run = 0; run < 2; run++) {
        const r = await crashOnce(dbFile);
        expect(r.acked, `run ${run}: some writes acknowledged`).toBeGreaterThan(0);
        expect(r.missing, `run ${run}: acknowledged writes lost`).toBe(0);
        expect(r.integrity).toBe('ok');
        total += r.acked;
      }
      console.log(`[crash drill] 2 runs, ${total} acknowledged writes, none lost`);
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  }, 120_000);
});
