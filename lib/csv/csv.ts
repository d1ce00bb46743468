import 'server-only';
import Papa from 'papaparse';

// CSV through papaparse (unparse and parse), never string joining. Cells that
// a spreadsheet would run as a formula (starting with =, +, -, @, tab or
// carriage return) are written with a leading apostrophe (papaparse's
// escapeFormulae, after OWASP "CSV Injection"); numbers stay numbers.
export function toCsv(fields: string[], rows: Record<string, string | number | null>[]): string {
  return Papa.unparse({ fields, data: rows.map((r) => fields.map((f) => r[f] ?? '')) }, { escapeFormulae: true, newline: '\r\n' });
}

const ESCAPED = /^'[=+\-@\t\r]/;

// The rows of a CSV file with a header line, each cell trimmed, the export's
// formula escape undone (so an export imports as it was), blank lines skipped.
export function parseCsv(text: string): { fields: string[]; rows: Record<string, string>[]; errors: string[] } {
  const out = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ''), {
    header: true,
    skipEmptyLines: 'greedy',
    transformHeader: (h) => h.trim().toLowerCase(),
    transform: (v) => {
      const t = v.trim();
      return ESCAPED.test(t) ? t.slice(1) : t;
    },
  });
  const errors = out.errors.map((e) => `row ${(e.row ?? 0) + 2}: ${e.message}`);
  return { fields: out.meta.fields ?? [], rows: out.data, errors };
}

export function csvResponse(csv: string, fileName: string) {
  return new Response(csv, {
    status: 200,
    headers: {
      'content-type': 'text/csv; charset=utf-8',
      'content-disposition': `attachment; filename="${fileName.replace(/[^A-Za-z0-9._-]/g, '_')}"`,
      'cache-control': 'no-store',
    },
  });
}
