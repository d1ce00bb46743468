import 'server-only';
import { db } from '@/db';
import type { DB } from '@/db/open';
import type { Member } from '@/db/queries/members';
import { requireRole } from '@/lib/auth/current';
import { ApiError, json, readJson, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { isUniqueViolation } from '@/lib/libraries/nameTaken';
import { csvImportSchema } from '@/lib/validations/csv';
import type { ImportResult } from './importLibrary';

// POST { csv, commit? } for a library import (leads and owners): 200 the
// preview (rows and per-row errors, nothing written); with commit, 201 when
// every row was written, else 422 naming the bad rows and writing none.
export function importRoute<T>(what: string, run: (database: DB, member: Member, csv: string, commit: boolean) => ImportResult<T>) {
  return withApi(async (req) => {
    assertSameOrigin(req);
    const member = await requireRole('lead');
    const body = await readJson(req, csvImportSchema);
    let result: ImportResult<T>;
    try {
      result = run(db(), member, body.csv, body.commit);
    } catch (err) {
      if (isUniqueViolation(err)) throw new ApiError(409, 'name_taken', `a ${what} in the file was added to the library meanwhile; preview again`);
      throw err;
    }
    if (body.commit && result.errors.length) {
      const first = result.errors.slice(0, 3).map((e) => `row ${e.row}: ${e.message}`).join('; ');
      return json({ error: { code: 'invalid_rows', message: `Nothing was imported: ${result.errors.length} row${result.errors.length > 1 ? 's' : ''} to fix (${first})` }, errors: result.errors }, 422);
    }
    return json(result, body.commit ? 201 : 200);
  });
}
