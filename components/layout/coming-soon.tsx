// A section that is planned but not built yet says so plainly.
export function ComingSoon({ title, what }: { title: string; what: string }) {
  return (
    <section>
      <h1 className="text-2xl font-semibold">{title}</h1>
      <p className="mt-3 max-w-prose rounded-md border border-dashed border-panel-line bg-white p-4 text-ink-soft">
        Not built yet. {what}
      </p>
    </section>
  );
}
