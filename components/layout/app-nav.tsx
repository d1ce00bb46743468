'use client';

import dynamic from 'next/dynamic';
import Link from 'next/link';
import { usePathname, useRouter } from 'next/navigation';
import { useEffect, useId, useState } from 'react';
import { Wordmark } from './wordmark';

// The sign-off count, for leads and owners only: its code loads when it is shown.
const QueueBadge = dynamic(() => import('./queue-badge').then((m) => m.QueueBadge));

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

type Member = { name: string; role: string; team: string };

// The main navigation. Wide screens show every section in a row; a phone gets
// a Menu button that opens them as a list with large targets, with the
// member's name and role. Leads and owners see how many pours wait for them.
export function AppNav({ member, devTools = false }: { member: Member; devTools?: boolean }) {
  const pathname = usePathname();
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  // The menu is open on the page it was opened on: navigating closes it.
  const [openOn, setOpenOn] = useState<string | null>(null);
  const open = openOn === pathname;
  const setOpen = (v: boolean) => setOpenOn(v ? pathname : null);
  const menuId = useId();
  const decides = member.role === 'lead' || member.role === 'owner';
  useEffect(() => {
    if (!open) return;
    const onKey = (e: KeyboardEvent) => e.key === 'Escape' && setOpenOn(null);
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [open]);
  async function signOut() {
    setBusy(true);
    await fetch('/api/auth/sign-out', { method: 'POST' }).catch(() => null);
    router.replace('/sign-in');
    router.refresh();
  }
  const links = devTools ? [...LINKS, { href: '/dev/mailbox', label: 'Mailbox' }] : LINKS;
  const badge = decides ? <QueueBadge /> : null;
  const signOutButton = (
    <button type="button" onClick={signOut} disabled={busy} className="min-h-tap rounded-md border border-panel-line bg-white px-3 font-medium hover:bg-panel">
      Sign out
    </button>
  );
  return (
    <header className="border-b border-panel-line bg-panel-deep">
      <div className="relative mx-auto flex max-w-7xl items-center gap-x-4 px-4 py-2">
        <Link href="/matches" aria-label="Pourproof home" className="shrink-0"><Wordmark /></Link>
        <nav aria-label="Main" className="flex-1">
          <button
            type="button"
            aria-expanded={open}
            aria-controls={menuId}
            onClick={() => setOpen(!open)}
            className="ml-auto flex min-h-tap items-center rounded-md border border-panel-line bg-white px-4 font-medium lg:hidden"
          >
            {open ? 'Close menu' : 'Menu'}{badge}
          </button>
          <div
            id={menuId}
            className={`${open ? 'block' : 'hidden'} absolute inset-x-0 top-full z-30 border-b border-panel-line bg-panel-deep px-4 pb-4 shadow-lg lg:static lg:block lg:border-0 lg:p-0 lg:shadow-none`}
          >
            <ul className="grid gap-1 py-2 lg:flex lg:flex-wrap lg:py-0">
              {links.map((l) => {
                const active = pathname === l.href || pathname.startsWith(`${l.href}/`);
                return (
                  <li key={l.href}>
                    <Link
                      href={l.href}
                      aria-current={active ? 'page' : undefined}
                      className={`flex min-h-tap items-center whitespace-nowrap rounded-md px-3 font-medium lg:px-2.5 ${active ? 'bg-white text-ink shadow-sm' : 'text-ink-soft hover:bg-white/60'}`}
                    >
                      {l.label}{l.href === '/matches' ? badge : null}
                    </Link>
                  </li>
                );
              })}
            </ul>
            <div className="flex items-center justify-between gap-3 border-t border-panel-line pt-3 text-sm lg:hidden">
              <MemberName member={member} />
              {signOutButton}
            </div>
          </div>
        </nav>
        <div className="ml-auto hidden items-center gap-3 text-sm lg:flex">
          <MemberName member={member} className="text-right" />
          {signOutButton}
        </div>
      </div>
    </header>
  );
}

// Who is signed in, and as what: in the phone menu and beside the desktop navigation.
function MemberName({ member, className }: { member: { name: string; role: string; team: string }; className?: string }) {
  return (
    <span className={className}>
      <span className="block font-medium">{member.name}</span>
      <span className="block text-ink-soft">{member.team} · {member.role}</span>
    </span>
  );
}
