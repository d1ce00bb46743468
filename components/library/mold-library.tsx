'use client';

import useSWR from 'swr';
import { Button } from '@/components/ui/button';
import type { MoldView } from '@/db/queries/libraries';
import { swrFetcher } from '@/lib/http/client';
import { ArchiveButton } from './archive-button';
import { EditorPanel, useEditor } from './editor-panel';
import { inches, millilitres } from './format';
import { LibraryTable, RowName } from './library-table';
import { MoldForm } from './mold-form';

const KEY = '/api/molds';
const HEADERS = ['Name', 'Body style', 'Length', 'Cavities', 'Plastisol per cavity', 'Body thickness'];
const NUMERIC = new Set(['Length', 'Cavities', 'Plastisol per cavity']);

// The mold library: everyone in the team reads it; leads and owners add,
// edit and archive (the server checks the role again on every write).
export function MoldLibrary({ initial, canEdit }: { initial: MoldView[]; canEdit: boolean }) {
  const { data, error, mutate } = useSWR<MoldView[]>(KEY, swrFetcher, { fallbackData: initial });
  const rows = data ?? initial;
  const editor = useEditor(rows.length === 0);
  const editing = typeof editor.mode === 'object' ? rows.find((r) => r.id === (editor.mode as { id: string }).id) : undefined;
  const refresh = async () => {
    await mutate();
  };

  return (
    <div className="mt-4 space-y-4">
      {canEdit ? (
        <EditorPanel editor={editor} addLabel="Add a mold" editTitle={editing ? `Edit “${editing.name}”` : null}>
          {editing ? (
            <MoldForm key={editing.id} mold={editing} onCancel={editor.close} onSaved={async () => { await refresh(); editor.close(); }} />
          ) : (
            <MoldForm onCancel={editor.close} onSaved={refresh} />
          )}
        </EditorPanel>
      ) : null}
      {error ? <p role="alert" className="text-sm text-band-off">The list could not be refreshed: {(error as Error).message}</p> : null}
      <LibraryTable headers={HEADERS} numeric={NUMERIC} caption="Mold library" empty={rows.length === 0 ? (canEdit ? 'No molds yet. Add the molds you pour with; yields and batch sheets work from them.' : 'No molds yet; a lead or the owner adds them.') : null}>
        {rows.map((m) => (
          <tr key={m.id} className="border-t border-panel-line align-top">
            <RowName name={m.name}>
              {canEdit ? (
                <>
                  <Button type="button" variant="secondary" onClick={() => editor.edit(m.id)} aria-label={`Edit ${m.name}`}>Edit</Button>
                  <ArchiveButton path={`${KEY}/${m.id}`} name={m.name} what="mold" onArchived={refresh} />
                </>
              ) : null}
            </RowName>
            <td className="p-3">{m.bodyStyle}</td>
            <td className="p-3 text-right whitespace-nowrap">{m.lengthIn === null ? '—' : inches(m.lengthIn)}</td>
            <td className="p-3 text-right">{m.cavities}</td>
            <td className="p-3 text-right whitespace-nowrap">{millilitres(m.mlPerCavity)}</td>
            <td className="p-3">{m.thickness}</td>
          </tr>
        ))}
      </LibraryTable>
    </div>
  );
}
