export function Wordmark({ className = '' }: { className?: string }) {
  return (
    <span className={`text-xl font-semibold tracking-tight ${className}`} aria-label="Rfolio">
      <span className="font-mono text-front">Rf</span>
      <span>olio</span>
    </span>
  );
}
