/** Placeholder for a page whose issue is still open; it says so plainly. */
export function ComingPage({ title, issue }: { title: string; issue: number }) {
  return (
    <section className="rounded-plate border border-dashed border-line bg-surface p-8">
      <h1 className="text-xl font-semibold">{title}</h1>
      <p className="mt-2 text-ink-soft">Coming: this page is being built (issue {issue}).</p>
    </section>
  );
}
