import type { ReactNode } from 'react';

interface CardProps {
  title?: ReactNode;
  /** Controls shown at the right of the title (links, small buttons). */
  actions?: ReactNode;
  children: ReactNode;
  className?: string;
  /** Heading level of the title, to keep the page outline right (default 2). */
  level?: 2 | 3 | 4;
}

/** A white panel on the plate background: cards are for reading, tables for scanning. */
export function Card({ title, actions, children, className = '', level = 2 }: CardProps) {
  const Heading = `h${level}` as const;
  return (
    <section className={`rounded-plate border border-line bg-surface ${className}`}>
      {(title || actions) && (
        <header className="flex flex-wrap items-baseline justify-between gap-2 border-b border-line px-4 py-2.5">
          {title && <Heading className="text-sm font-semibold text-ink">{title}</Heading>}
          {actions && <div className="flex items-center gap-2 text-sm">{actions}</div>}
        </header>
      )}
      <div className="p-4">{children}</div>
    </section>
  );
}
