'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { apiFetch } from '@/lib/http/client';

type Preview = { rows: { row: number; value: { name: string } }[]; errors: { row: number; message: string }[]; written: number };

export function CsvDownload({ what, label }: { what: 'colorants' | 'molds' | 'standards' | 'batches'; label?: string }) {
  return (
    <a href={`/api/export/${what}`} download className="inline-flex min-h-tap items-center rounded-md border border-panel-line bg-white px-4 font-medium">
      {label ?? 'Download CSV'}
    </a>
  );
}

// Import a library from CSV: pick the file, see every row and every row's
// problem, and import only when the whole file is valid (the server writes
// all rows or none).
export function CsvImport({ what, onImported }: { what: 'colorants' | 'molds'; onImported: () => void | Promise<void> }) {
  const [open, setOpen] = useState(false);
  const [csv, setCsv] = useState<string | null>(null);
  const [fileName, setFileName] = useState('');
  const [preview, setPreview] = useState<Preview | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function send(text: string, commit: boolean) {
    setBusy(true);
    setError(null);
    try {
      const out = await apiFetch<Preview>(`/api/${what}/import`, { method: 'POST', body: JSON.stringify({ csv: text, commit }) });
      if (commit) {
        setDone(`Imported ${out.written} ${what === 'colorants' ? 'colorant' : 'mold'}${out.written === 1 ? '' : 's'} from ${fileName}.`);
        setPreview(null);
        setCsv(null);
        await onImported();
      } else setPreview(out);
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  }

  if (!open) return <Button type="button" variant="secondary" onClick={() => setOpen(true)}>Import CSV</Button>;
  return (
    <section aria-label={`Import ${what} from CSV`} className="w-full space-y-3 rounded-lg border border-panel-line bg-white p-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 className="text-lg font-semibold">Import {what} from CSV</h2>
        <Button type="button" variant="secondary" onClick={() => setOpen(false)}>Close</Button>
      </div>
      <p className="text-sm text-ink-soft">The columns of this library’s CSV download; names must be new to the library. Nothing is written unless every row is valid.</p>
      <input
        type="file" accept=".csv,text/csv" aria-label="CSV file" className="block min-h-tap text-sm"
        onChange={async (e) => {
          const f = e.target.files?.[0];
          setDone(null);
          setPreview(null);
          if (!f) return;
          if (f.size > 200_000) return setError('That file is over 200 kB: split it into smaller files.');
          const text = await f.text();
          setFileName(f.name);
          setCsv(text);
          await send(text, false);
        }}
      />
      <FormError message={error} />
      {done ? <p role="status" className="text-sm font-medium">{done}</p> : null}
      {preview ? (
        <div className="space-y-2 text-sm">
          <p className="font-medium">{preview.rows.length} row{preview.rows.length === 1 ? '' : 's'} ready{preview.errors.length ? `, ${preview.errors.length} to fix` : ''}.</p>
          {preview.errors.length ? (
            <ul aria-label="Rows to fix" className="space-y-1">
              {preview.errors.map((e, i) => <li key={i} className="text-band-off"><span className="num font-semibold">Row {e.row}:</span> {e.message}</li>)}
            </ul>
          ) : null}
          <ul aria-label="Rows ready" className="num max-h-48 overflow-y-auto">
            {preview.rows.map((r) => <li key={r.row}>Row {r.row}: {r.value.name}</li>)}
          </ul>
          <Button type="button" disabled={busy || preview.errors.length > 0 || !csv} onClick={() => csv && send(csv, true)}>
            {preview.errors.length ? 'Fix the rows above first' : `Import ${preview.rows.length} row${preview.rows.length === 1 ? '' : 's'}`}
          </Button>
        </div>
      ) : null}
    </section>
  );
}
