import type { ReactNode } from 'react';

interface EmptyStateProps {
  title: ReactNode;
  /** Why it is empty and what to do next, in a sentence or two. */
  children?: ReactNode;
  /** The next step: a button or link. */
  action?: ReactNode;
}

/** What to show instead of an empty list: why nothing is here and the next useful step. */
export function EmptyState({ title, children, action }: EmptyStateProps) {
  return (
    <div className="flex flex-col items-start gap-2 rounded-plate border border-dashed border-line bg-surface/60 px-5 py-6">
      <p className="font-medium text-ink">{title}</p>
      {children && <div className="max-w-prose text-sm text-ink-soft">{children}</div>}
      {action && <div className="mt-1">{action}</div>}
    </div>
  );
}
