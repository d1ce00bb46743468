'use client';

export default function BenchError({ reset }: { error: Error; reset: () => void }) {
  return (
    <div role="alert" className="rounded-md border border-band-off/40 bg-white p-4">
      <h2 className="font-semibold">This page could not load</h2>
      <p className="mt-1 text-ink-soft">Nothing was changed. Try again; if it keeps failing, reload the page.</p>
      <button type="button" onClick={reset} className="mt-3 min-h-tap rounded-md bg-accent px-4 font-medium text-white">
        Try again
      </button>
    </div>
  );
}
