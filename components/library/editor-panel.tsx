'use client';

import { type ReactNode, useEffect, useRef, useState } from 'react';
import { Button } from '@/components/ui/button';

type Mode = 'closed' | 'add' | { id: string };

// One place above the table where an entry is added or edited: on a phone the
// table scrolls sideways, so a form inside a row would be half off-screen.
export function useEditor(openAtStart: boolean) {
  const [mode, setMode] = useState<Mode>(openAtStart ? 'add' : 'closed');
  const ref = useRef<HTMLDivElement>(null);
  const [scrollSeq, setScrollSeq] = useState(0);
  useEffect(() => {
    if (scrollSeq) ref.current?.scrollIntoView({ block: 'start', behavior: 'smooth' });
  }, [scrollSeq]);
  return {
    mode,
    ref,
    add: () => setMode('add'),
    edit: (id: string) => {
      setMode({ id });
      setScrollSeq((n) => n + 1);
    },
    close: () => setMode('closed'),
  };
}

export type Editor = ReturnType<typeof useEditor>;

export function EditorPanel({ editor, addLabel, editTitle, children }: { editor: Editor; addLabel: string; editTitle: string | null; children: ReactNode }) {
  const { mode, ref } = editor;
  const editingGone = typeof mode === 'object' && !editTitle;
  if (mode === 'closed' || editingGone) {
    return (
      <div ref={ref}>
        <Button type="button" onClick={editor.add}>{addLabel}</Button>
      </div>
    );
  }
  return (
    <div ref={ref} className="scroll-mt-4 rounded-lg border border-panel-line bg-white p-4">
      <h2 className="mb-3 text-lg font-semibold">{mode === 'add' ? addLabel : editTitle}</h2>
      {children}
    </div>
  );
}
