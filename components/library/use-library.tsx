'use client';

import useSWR from 'swr';
import { Button } from '@/components/ui/button';
import { swrFetcher } from '@/lib/http/client';
import { ArchiveButton } from './archive-button';
import { useEditor } from './editor-panel';

// One library list (colorants or molds): its rows from SWR, the add/edit panel
// state, and the row being edited.
export function useLibrary<T extends { id: string }>(key: string, initial: T[]) {
  const { data, error, mutate } = useSWR<T[]>(key, swrFetcher, { fallbackData: initial });
  const rows = data ?? initial;
  const editor = useEditor(rows.length === 0);
  const editing = typeof editor.mode === 'object' ? rows.find((r) => r.id === (editor.mode as { id: string }).id) : undefined;
  const refresh = async () => {
    await mutate();
  };
  const savedEdit = async () => {
    await refresh();
    editor.close();
  };
  return { rows, error, editor, editing, refresh, savedEdit };
}

// Edit and Archive for one row, for leads and owners.
export function RowActions({ path, name, what, onEdit, onArchived }: { path: string; name: string; what: 'mold' | 'colorant'; onEdit: () => void; onArchived: () => Promise<void> }) {
  return (
    <>
      <Button type="button" variant="secondary" onClick={onEdit} aria-label={`Edit ${name}`}>Edit</Button>
      <ArchiveButton path={path} name={name} what={what} onArchived={onArchived} />
    </>
  );
}

export function RefreshError({ error }: { error: unknown }) {
  if (!error) return null;
  return <p role="alert" className="text-sm text-band-off">The list could not be refreshed: {(error as Error).message}</p>;
}
