import type { NeutralMark } from '@/db/queries/light';
import { trimmed } from '@/lib/format';

// Said beside a ΔE00 when the reference was corrected from a grey card and
// this photo was not: the figure then mixes a change of light with a change
// of colour, and cannot tell them apart.
export function LightNote({ light }: { light?: { corrected: boolean; referenceCorrected: boolean } | null }) {
  if (!light || light.corrected || !light.referenceCorrected) return null;
  return (
    <p className="text-sm font-medium">
      <span aria-hidden>⚠ </span>Light not corrected: the figure mixes light and colour. The reference was shot with a grey card; mark the card on this photo to compare colour alone.
    </p>
  );
}

// Under a pour or batch sampler: the card's mark and nominal L* were carried
// over from the match's last photo.
export function CardCarriedNote({ neutral, marked }: { neutral: NeutralMark | null | undefined; marked: boolean }) {
  if (!neutral) return null;
  if (!marked) return <p className="text-sm">Grey card not marked: the reference had one, so mark it if it is in frame (pick “grey card”, then draw).</p>;
  return (
    <p className="text-sm text-ink-soft">
      Grey card marked where it sat on the last photo{neutral.L ? `, nominal L* ${trimmed(neutral.L, 1)}` : ''}: move it if the card sits elsewhere in this one.
    </p>
  );
}
