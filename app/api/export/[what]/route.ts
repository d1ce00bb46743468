import { db } from '@/db';
import { requireMember } from '@/lib/auth/current';
import { csvResponse } from '@/lib/csv/csv';
import { batchesCsv, colorantsCsv, moldsCsv, standardsCsv } from '@/lib/csv/exportCsv';
import { notFound, withApi } from '@/lib/http/api';
import { EXPORTS, type ExportName } from '@/lib/validations/csv';

const BUILD = { colorants: colorantsCsv, molds: moldsCsv, standards: standardsCsv, batches: batchesCsv } as const;

// GET /api/export/colorants|molds|standards|batches → a CSV file of the team's records.
export const GET = withApi<{ what: string }>(async (_req, { params }) => {
  const member = await requireMember();
  const what = (await params).what.replace(/\.csv$/, '');
  if (!(EXPORTS as readonly string[]).includes(what)) throw notFound(`No such export (one of ${EXPORTS.join(', ')})`);
  const csv = BUILD[what as ExportName](db(), member.team.id);
  return csvResponse(csv, `${what}-${new Date().toISOString().slice(0, 10)}.csv`);
});
