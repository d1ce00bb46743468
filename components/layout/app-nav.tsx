'use client';

import Link from 'next/link';
import { usePathname, useRouter } from 'next/navigation';
import { useEffect, useRef, useState } from 'react';
import { Wordmark } from './wordmark';

const LINKS = [
  { href: '/matches', label: 'Matches' },
  { href: '/photos', label: 'Photos' },
  { href: '/colorants', label: 'Colorants' },
  { href: '/molds', label: 'Molds' },
  { href: '/standards', label: 'Standards' },
  { href: '/plan', label: 'Run plan' },
  { href: '/batches', label: 'Batches' },
  { href: '/team', label: 'Team' },
  { href: '/calculator', label: 'Calculator' },
];

export function AppNav({ member, devTools = false }: { member: { name: string; role: string; team: string }; devTools?: boolean }) {
  const pathname = usePathname();
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const navRef = useRef<HTMLElement>(null);
  // On a phone the links scroll sideways: keep the current section in view.
  useEffect(() => {
    navRef.current?.querySelector('[aria-current="page"]')?.scrollIntoView({ block: 'nearest', inline: 'center' });
  }, [pathname]);
  async function signOut() {
    setBusy(true);
    await fetch('/api/auth/sign-out', { method: 'POST' }).catch(() => null);
    router.replace('/sign-in');
    router.refresh();
  }
  return (
    <header className="border-b border-panel-line bg-panel-deep">
      <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-4 gap-y-2 px-4 py-2">
        <Link href="/matches" aria-label="Pourproof home"><Wordmark /></Link>
        <nav ref={navRef} aria-label="Main" className="order-3 -mx-1 flex w-full gap-1 overflow-x-auto sm:order-none sm:w-auto">
          {(devTools ? [...LINKS, { href: '/dev/mailbox', label: 'Mailbox' }] : LINKS).map((l) => {
            const active = pathname === l.href || pathname.startsWith(`${l.href}/`);
            return (
              <Link
                key={l.href}
                href={l.href}
                aria-current={active ? 'page' : undefined}
                className={`flex min-h-tap items-center whitespace-nowrap rounded-md px-2.5 font-medium ${active ? 'bg-white text-ink shadow-sm' : 'text-ink-soft hover:bg-white/60'}`}
              >
                {l.label}
              </Link>
            );
          })}
        </nav>
        <div className="ml-auto flex items-center gap-3 text-sm">
          <span className="hidden text-right xl:block">
            <span className="block font-medium">{member.name}</span>
            <span className="block text-ink-soft">{member.team} · {member.role}</span>
          </span>
          <button type="button" onClick={signOut} disabled={busy} className="min-h-tap rounded-md border border-panel-line bg-white px-3 font-medium hover:bg-panel">
            Sign out
          </button>
        </div>
      </div>
    </header>
  );
}
