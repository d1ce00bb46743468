import type { ReactNode } from 'react';

// Keeps the name column in view while the figures scroll sideways on a phone,
// with a hairline (box-shadow: collapsed borders do not stick) at its edge.
const STICKY = 'sticky left-0 z-10 shadow-[inset_-1px_0_0_#d6cfc4]';

// The library's table: the name column first and pinned, so each row's Edit
// and Archive stay in reach and the row stays named while scrolling. On a phone
// each row is a card (app/globals.css): every cell carries its column's name in
// data-label, through Cell; the explicit roles keep it a table to a screen
// reader when CSS changes its display.
export function LibraryTable({ headers, numeric, caption, empty, children }: { headers: string[]; numeric: Set<string>; caption: string; empty: string | null; children: ReactNode }) {
  return (
    <div>
      <div className="overflow-x-auto rounded-lg border border-panel-line bg-white">
        <table role="table" className="cards-on-phone w-full text-left text-sm">
          <caption className="sr-only">{caption}</caption>
          <thead className="bg-panel-deep">
            <tr role="row">
              {headers.map((h, i) => (
                <th key={h} scope="col" role="columnheader" className={`p-3 align-bottom ${numeric.has(h) ? 'text-right' : ''} ${i === 0 ? `${STICKY} bg-panel-deep` : ''}`}>{h}</th>
              ))}
            </tr>
          </thead>
          <tbody>{children}</tbody>
        </table>
      </div>
      {empty ? <p className="mt-2 text-ink-soft">{empty}</p> : null}
    </div>
  );
}

export function RowName({ name, sub, children }: { name: string; sub?: string; children?: ReactNode }) {
  return (
    <th scope="row" role="rowheader" className={`${STICKY} w-44 min-w-44 bg-white p-3 font-medium`}>
      <span className="block break-words">{name}</span>
      {sub ? <span className="block text-sm font-normal text-ink-soft">{sub}</span> : null}
      {children ? <div className="mt-2 flex flex-wrap items-start gap-2 font-normal">{children}</div> : null}
    </th>
  );
}

export function Cell({ label, numeric, className = '', children }: { label: string; numeric?: boolean; className?: string; children: ReactNode }) {
  return (
    <td role="cell" data-label={label} className={`p-3 ${numeric ? 'text-right whitespace-nowrap' : ''} ${className}`}>
      <div>{children}</div>
    </td>
  );
}
