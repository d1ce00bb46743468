import { AppNav } from '@/components/layout/app-nav';
import { requirePageMember } from '@/lib/auth/current';

export default async function BenchLayout({ children }: { children: React.ReactNode }) {
  const member = await requirePageMember();
  return (
    <div className="min-h-screen">
      <AppNav member={{ name: member.user.name, role: member.role, team: member.team.name }} />
      <main className="mx-auto max-w-6xl px-4 py-6">{children}</main>
    </div>
  );
}
