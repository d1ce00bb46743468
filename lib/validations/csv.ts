import { z } from 'zod';

// A CSV import: the file's text (under the JSON body limit) and whether to
// write it (commit) or only preview it.
export const csvImportSchema = z.object(
  {
    csv: z.string({ error: 'csv must be the text of a CSV file' }).min(1, 'csv is empty'),
    commit: z.boolean({ error: 'commit must be true or false' }).optional().default(false),
  },
  { error: 'the body must be a JSON object { csv, commit? }' },
);

export const EXPORTS = ['colorants', 'molds', 'standards', 'batches'] as const;
export type ExportName = (typeof EXPORTS)[number];
