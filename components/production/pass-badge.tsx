// Pass or fail against the tolerance as a word and a shape, never colour alone.
export function PassBadge({ pass, size = 'md' }: { pass: boolean; size?: 'md' | 'lg' }) {
  const big = size === 'lg' ? 'px-3 py-1 text-lg' : 'px-2 py-0.5 text-sm';
  return (
    <span
      className={`inline-flex items-center gap-1 whitespace-nowrap rounded-full border font-semibold ${big} ${pass ? 'border-band-ok/50 text-band-ok' : 'border-band-off/50 text-band-off'}`}
    >
      <span aria-hidden>{pass ? '✓' : '✕'}</span>
      {pass ? 'pass' : 'fail'}
    </span>
  );
}
