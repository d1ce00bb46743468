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
    <div className="min-h-screen">
      <AppNav member={{ name: member.user.name, role: member.role, team: member.team.name }} devTools={env().POURPROOF_DEV_TOOLS === '1' && Boolean(env().MAIL_FAKE_URL)} />
      <main className="mx-auto max-w-7xl px-4 py-6">{children}</main>
    </div>
    </ShopTimeZoneProvider>
  );
}
