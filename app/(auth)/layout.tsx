import { Wordmark } from '@/components/layout/wordmark';

export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center px-4 py-10">
      <Wordmark className="mb-6" />
      <div className="rounded-lg border border-panel-line bg-white p-6 shadow-sm">{children}</div>
      <p className="mt-6 text-sm text-ink-soft">
        Colour matching for soft-plastic bait shops: every test pour measured against the target in ΔE00.
      </p>
    </main>
  );
}
