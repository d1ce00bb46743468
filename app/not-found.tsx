import Link from 'next/link';

export default function NotFound() {
  return (
    <main className="mx-auto max-w-lg p-8">
      <h1 className="text-2xl font-semibold">Not found</h1>
      <p className="mt-2 text-ink-soft">There is nothing here, or it belongs to another shop.</p>
      <Link href="/matches" className="mt-4 inline-block font-medium text-accent underline">Back to matches</Link>
    </main>
  );
}
