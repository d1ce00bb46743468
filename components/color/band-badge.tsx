import type { Band } from '@/lib/color/types';

// The band as a word and a shape, never colour alone. Bands: ≤ 1.0
// indistinguishable, ≤ 2.0 close, ≤ 3.5 noticeable, above that off — common
// rules of thumb for photo-based work, not a standard.
const SHAPE: Record<Band, string> = { indistinguishable: '◆', close: '●', noticeable: '▲', off: '✕' };
const TONE: Record<Band, string> = {
  indistinguishable: 'text-band-ok',
  close: 'text-band-close',
  noticeable: 'text-band-warn',
  off: 'text-band-off',
};

export function BandBadge({ band, className = '' }: { band: Band; className?: string }) {
  return (
    <span className={`inline-flex items-center gap-1 whitespace-nowrap font-medium ${TONE[band]} ${className}`}>
      <span aria-hidden>{SHAPE[band]}</span>
      {band}
    </span>
  );
}
