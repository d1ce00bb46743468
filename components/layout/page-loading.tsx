export function PageLoading() {
  return <p className="py-8 text-ink-soft" role="status">Loading…</p>;
}
