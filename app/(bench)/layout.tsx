import { AppNav } from '@/components/layout/app-nav';
import { requirePageMember } from '@/lib/auth/current';
import { env } from '@/lib/env';

export default async function BenchLayout({ children }: { children: React.ReactNode }) {
  const member = await requirePageMember();
  return (
    <div className="min-h-screen">
      <AppNav member={{ name: member.user.name, role: member.role, team: member.team.name }} devTools={member.role === 'owner' && env().POURPROOF_DEV_TOOLS === '1' && Boolean(env().MAIL_FAKE_URL)} />
      <main className="mx-auto max-w-7xl px-4 py-6">{children}</main>
    </div>
  );
}
