import 'server-only';
import { db } from '@/db';
import { requireMember } from '@/lib/auth/current';
import { withApi } from '@/lib/http/api';
import { type ExportName } from '@/lib/validations/csv';
import { csvResponse } from './csv';
import { batchesCsv, colorantsCsv, moldsCsv, standardsCsv } from './exportCsv';

const BUILD = { colorants: colorantsCsv, molds: moldsCsv, standards: standardsCsv, batches: batchesCsv } as const;

// GET /api/export/<what>: a CSV file of the team's records, for any member.
export function exportRoute(what: ExportName) {
  return withApi(async () => {
    const member = await requireMember();
    return csvResponse(BUILD[what](db(), member.team.id), `${what}-${new Date().toISOString().slice(0, 10)}.csv`);
  });
}
