// Shown wherever the app tells someone to heat, pour or inject plastisol.
export function HeatCaution({ compact = false }: { compact?: boolean }) {
  return (
    <aside role="note" aria-label="Safety caution" className="rounded-md border border-band-warn/40 bg-white p-3 text-sm">
      <p className="font-semibold">⚠ Hot plastisol burns and gives off fumes</p>
      {compact ? (
        <p className="mt-1">Gloves, long sleeves, eye protection, good ventilation; stay within the plastisol maker&apos;s temperature range (about 325–350 °F is usual). The safety data sheet and local codes come first.</p>
      ) : (
        <ul className="mt-1 list-disc space-y-0.5 pl-5">
          <li>Wear heat-resistant gloves, long sleeves and eye protection.</li>
          <li>Work with good ventilation, and a respirator where the product&apos;s safety data sheet asks for one.</li>
          <li>Pots, cups and microwaves used for plastisol are never used for food again.</li>
          <li>Stay within the plastisol maker&apos;s temperature range: about 325–350 °F (roughly 170 °C) is usual; overheated plastisol yellows, browns or burns.</li>
          <li>Follow the product&apos;s safety data sheet and your local codes first.</li>
        </ul>
      )}
    </aside>
  );
}
