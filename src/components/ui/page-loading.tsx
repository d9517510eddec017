export function PageLoading({ label = 'Loading…' }: { label?: string }) {
  return (
    <p role="status" className="py-12 text-center text-ink-soft">
      {label}
    </p>
  );
}
