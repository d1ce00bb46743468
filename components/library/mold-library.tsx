'use client';

import type { MoldView } from '@/db/queries/libraries';
import { EditorPanel } from './editor-panel';
import { inches, millilitres } from './format';
import { Cell, LibraryTable, RowName } from './library-table';
import { RefreshError, RowActions, useLibrary } from './use-library';
import { MoldForm } from './mold-form';
import { CsvDownload, CsvImport } from './csv-tools';

const KEY = '/api/molds';
const HEADERS = ['Name', 'Body style', 'Length', 'Cavities', 'Plastisol per cavity', 'Body thickness'];
const NUMERIC = new Set(['Length', 'Cavities', 'Plastisol per cavity']);

// The mold library: everyone in the team reads it; leads and owners add,
// edit and archive (the server checks the role again on every write).
export function MoldLibrary({ initial, canEdit }: { initial: MoldView[]; canEdit: boolean }) {
  const { rows, error, editor, editing, refresh, savedEdit } = useLibrary<MoldView>(KEY, initial);

  return (
    <div className="mt-4 space-y-4">
      {canEdit ? (
        <EditorPanel editor={editor} addLabel="Add a mold" editTitle={editing ? `Edit “${editing.name}”` : null}>
          {editing ? (
            <MoldForm key={editing.id} mold={editing} onCancel={editor.close} onSaved={savedEdit} />
          ) : (
            <MoldForm onCancel={editor.close} onSaved={refresh} />
          )}
        </EditorPanel>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <CsvDownload what="molds" />
        {canEdit ? <CsvImport what="molds" onImported={refresh} /> : null}
      </div>
      <RefreshError error={error} />
      <LibraryTable headers={HEADERS} numeric={NUMERIC} caption="Mold library" empty={rows.length === 0 ? (canEdit ? 'No molds yet. Add the molds you pour with; yields and batch sheets work from them.' : 'No molds yet; a lead or the owner adds them.') : null}>
        {rows.map((m) => (
          <tr role="row" key={m.id} className="border-t border-panel-line align-top">
            <RowName name={m.name}>
              {canEdit ? <RowActions path={`${KEY}/${m.id}`} name={m.name} what="mold" onEdit={() => editor.edit(m.id)} onArchived={refresh} /> : null}
            </RowName>
            <Cell label={HEADERS[1]!}>{m.bodyStyle}</Cell>
            <Cell label={HEADERS[2]!} numeric>{m.lengthIn === null ? '—' : inches(m.lengthIn)}</Cell>
            <Cell label={HEADERS[3]!} numeric>{m.cavities}</Cell>
            <Cell label={HEADERS[4]!} numeric>{millilitres(m.mlPerCavity)}</Cell>
            <Cell label={HEADERS[5]!}>{m.thickness}</Cell>
          </tr>
        ))}
      </LibraryTable>
    </div>
  );
}
