// Status as a word plus a shape, never colour alone.
const ICON: Record<string, string> = { open: '○', in_review: '◐', approved: '●', archived: '▫' };
const LABEL: Record<string, string> = { open: 'open', in_review: 'in review', approved: 'approved', archived: 'archived' };

export function StatusBadge({ status }: { status: string }) {
  return (
    <span className="inline-flex items-center gap-1 whitespace-nowrap rounded-full border border-panel-line bg-panel px-2 py-0.5 text-xs font-medium">
      <span aria-hidden>{ICON[status] ?? '·'}</span>
      {LABEL[status] ?? status}
    </span>
  );
}
