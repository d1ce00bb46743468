'use client';

import { type ReactNode, useRef } from 'react';
import { useFocusFirstField } from '@/components/ui/use-focus-first-field';
import type { MatchDetail } from '@/db/queries/matchDetail';

// The match page on a phone is long: a bar of in-page links jumps to each part
// of it (target, pours, compare, sign-off, batches). It is not sticky: a bar
// floating over the sampler would catch the thumb that draws a zone.
// A new match has only its target, so it gets no bar.
export function JumpBar({ match, hasSelection }: { match: MatchDetail; hasSelection: boolean }) {
  const parts = [
    { id: 'target', label: 'Target', show: true },
    { id: 'pours', label: `Pours (${match.pours.length})`, show: Boolean(match.target) },
    { id: 'compare', label: 'Compare', show: Boolean(match.target) && hasSelection },
    { id: 'signoff', label: 'Sign-off', show: Boolean(match.target) && hasSelection },
    { id: 'batches', label: 'Batches', show: Boolean(match.standardPourId) },
  ].filter((p) => p.show);
  if (parts.length < 2) return null;
  return (
    <nav aria-label="On this page" className="-mx-4 border-y border-panel-line px-4">
      <ul className="flex gap-1 overflow-x-auto">
        {parts.map((p) => (
          <li key={p.id}>
            <a href={`#${p.id}`} className="flex min-h-tap items-center whitespace-nowrap rounded-md px-3 text-sm font-medium text-accent hover:bg-white">
              {p.label}
            </a>
          </li>
        ))}
      </ul>
    </nav>
  );
}

/** A wrapper for a form that has just opened: its first field takes the focus. */
export function FocusFirstField({ className, children }: { className?: string; children: ReactNode }) {
  const ref = useRef<HTMLDivElement>(null);
  useFocusFirstField(ref);
  return <div ref={ref} className={className}>{children}</div>;
}
