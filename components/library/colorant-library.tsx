'use client';

import type { ColorantView } from '@/db/queries/libraries';
import { COLORANT_KINDS } from '@/lib/enums';
import { ColorantForm } from './colorant-form';
import { EditorPanel } from './editor-panel';
import { KIND_LABEL, amountOf, costPer, inches, lab } from './format';
import { Cell, LibraryTable, RowName } from './library-table';
import { RefreshError, RowActions, useLibrary } from './use-library';
import { LowMark, StockPanel } from './stock-panel';
import { CsvDownload, CsvImport } from './csv-tools';
import { Button } from '@/components/ui/button';
import { useState } from 'react';

const KEY = '/api/colorants';
const HEADERS = ['Name', 'Kind', 'Flake size and colour', 'Cost per unit', 'Stock', 'Swatch, CIELAB (D65)'];
const KIND_ORDER = new Map(COLORANT_KINDS.map((k, i) => [k, i]));

// In the order a recipe is built: base, pigments, pearls, flakes, glow, additives.
const byKindThenName = (x: ColorantView, y: ColorantView) => KIND_ORDER.get(x.kind)! - KIND_ORDER.get(y.kind)! || x.name.localeCompare(y.name, 'en');
const NUMERIC = new Set(['Flake size and colour', 'Cost per unit', 'Stock']);

// The colorant library: everyone in the team reads it; leads and owners add,
// edit and archive (the server checks the role again on every write).
export function ColorantLibrary({ initial, canEdit }: { initial: ColorantView[]; canEdit: boolean }) {
  const lib = useLibrary<ColorantView>(KEY, initial);
  const { editor, editing, refresh, savedEdit } = lib;
  const rows = [...lib.rows].sort(byKindThenName);
  const [stockFor, setStockFor] = useState<string | null>(null);
  const isLow = (c: ColorantView) => c.stock !== null && c.lowStockAt !== null && c.stock < c.lowStockAt;

  return (
    <div className="mt-4 space-y-4">
      {canEdit ? (
        <EditorPanel editor={editor} addLabel="Add a colorant" editTitle={editing ? `Edit “${editing.name}”` : null}>
          {editing ? (
            <ColorantForm key={editing.id} colorant={editing} onCancel={editor.close} onSaved={savedEdit} />
          ) : (
            <ColorantForm onCancel={editor.close} onSaved={refresh} />
          )}
        </EditorPanel>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <CsvDownload what="colorants" />
        {canEdit ? <CsvImport what="colorants" onImported={refresh} /> : null}
      </div>
      {stockFor ? <StockPanel key={stockFor} colorantId={stockFor} canEdit={canEdit} onClose={() => setStockFor(null)} onMoved={refresh} /> : null}
      <RefreshError error={lib.error} />
      <LibraryTable headers={HEADERS} numeric={NUMERIC} caption="Colorant library" empty={rows.length === 0 ? (canEdit ? 'The library is empty. Add the plastisol base first, then the pigments, pearls and flakes your recipes use.' : 'The library is empty; a lead or the owner adds colorants.') : null}>
        {rows.map((c) => (
          <tr role="row" key={c.id} className="border-t border-panel-line align-top">
            <RowName name={c.name} sub={c.stock === null ? undefined : `${amountOf(c.stock, c.unit)} on the shelf${isLow(c) ? ' · ▼ low' : ''}`}>
              {canEdit ? <RowActions path={`${KEY}/${c.id}`} name={c.name} what="colorant" onEdit={() => editor.edit(c.id)} onArchived={refresh} /> : null}
              <Button type="button" variant="secondary" onClick={() => setStockFor(c.id)} aria-label={`Stock of ${c.name}`}>Stock</Button>
            </RowName>
            <Cell label={HEADERS[1]!}>
              {KIND_LABEL[c.kind]}
              <span className="block text-ink-soft">dosed in {c.unit === 'ml' ? 'mL' : c.unit}</span>
            </Cell>
            <Cell label={HEADERS[2]!} numeric>{c.flakeSizeIn === null ? '—' : `${inches(c.flakeSizeIn)}${c.flakeColor ? `, ${c.flakeColor}` : ''}`}</Cell>
            <Cell label={HEADERS[3]!} numeric>{c.costPerUnit === null ? '—' : costPer(c.costPerUnit, c.unit)}</Cell>
            <Cell label={HEADERS[4]!} numeric>
              {c.stock === null ? '—' : amountOf(c.stock, c.unit)}
              {isLow(c) ? <span className="block"><LowMark /></span> : null}
            </Cell>
            <Cell label={HEADERS[5]!} className="whitespace-pre">{c.swatch ? lab(c.swatch) : '—'}</Cell>
          </tr>
        ))}
      </LibraryTable>
    </div>
  );
}
