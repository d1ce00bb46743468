import { AppNav } from '@/components/layout/app-nav';
import { ShopTimeZoneProvider } from '@/components/ui/when';
import { db } from '@/db';
import { getTeamSettings } from '@/db/queries/teams';
import { requirePageMember } from '@/lib/auth/current';
import { env } from '@/lib/env';

export default async function BenchLayout({ children }: { children: React.ReactNode }) {
  const member = await requirePageMember();
  const timeZone = getTeamSettings(db(), member.team.id)?.timeZone ?? 'UTC';
  return (
    <ShopTimeZoneProvider timeZone={timeZone}>
      <a href="#main" className="sr-only z-50 rounded-md bg-white px-4 py-3 font-medium focus:not-sr-only focus:absolute focus:left-2 focus:top-2">
        Skip to content
      </a>
      <div className="min-h-screen">
        <AppNav member={{ name: member.user.name, role: member.role, team: member.team.name }} devTools={member.role === 'owner' && env().POURPROOF_DEV_TOOLS === '1' && Boolean(env().MAIL_FAKE_URL)} />
        <main id="main" tabIndex={-1} className="mx-auto max-w-7xl px-4 py-6 focus:outline-none">{children}</main>
      </div>
    </ShopTimeZoneProvider>
  );
}
