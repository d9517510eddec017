/** Marks invented demo records and compounds, so nobody mistakes them for the group's results. */
export function DemoMark({ className = '' }: { className?: string }) {
  return (
    <span
      title="Invented for the demo: not a real result"
      className={
        `inline-block rounded-plate border border-dashed border-ink-soft/60 px-1 text-2xs ` +
        `uppercase tracking-wider text-ink-soft ${className}`
      }
    >
      demo data
    </span>
  );
}
