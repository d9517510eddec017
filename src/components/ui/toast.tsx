import { useSyncExternalStore } from 'react';

type ToastTone = 'done' | 'problem';

export interface Toast {
  id: number;
  title: string;
  body?: string;
  tone: ToastTone;
}

let toasts: Toast[] = [];
let nextId = 1;
const listeners = new Set<() => void>();
const emit = () => listeners.forEach((listener) => listener());

/** Dismisses a toast. */
function dismissToast(id: number) {
  toasts = toasts.filter((toast) => toast.id !== id);
  emit();
}

/**
 * Announces that background work finished (LOOK.md: toasts only for background work, e.g. imports).
 * It stays 10 s, or until dismissed; screen readers hear it through a polite live region.
 */
export function showToast(toast: Omit<Toast, 'id'>): number {
  const id = nextId++;
  toasts = [...toasts, { ...toast, id }];
  emit();
  setTimeout(() => dismissToast(id), 10_000);
  return id;
}

const subscribe = (listener: () => void) => {
  listeners.add(listener);
  return () => listeners.delete(listener);
};

/** Where toasts appear: bottom right, above the page, mounted once in the app layout. */
export function Toaster() {
  const current = useSyncExternalStore(
    subscribe,
    () => toasts,
    () => toasts,
  );
  return (
    <div
      aria-live="polite"
      className="pointer-events-none fixed bottom-4 right-4 z-50 flex w-80 max-w-[calc(100vw-2rem)] flex-col gap-2"
    >
      {current.map((toast) => (
        <div
          key={toast.id}
          role="status"
          className={
            `pointer-events-auto rounded-plate border bg-surface px-4 py-3 shadow-md ` +
            `${toast.tone === 'problem' ? 'border-failed' : 'border-front'}`
          }
        >
          <div className="flex items-start justify-between gap-3">
            <p className={`text-sm font-semibold ${toast.tone === 'problem' ? 'text-failed' : 'text-front-dark'}`}>
              {toast.title}
            </p>
            <button
              type="button"
              onClick={() => dismissToast(toast.id)}
              className="text-ink-soft hover:text-ink"
              aria-label="Dismiss"
            >
              ×
            </button>
          </div>
          {toast.body && <p className="mt-1 text-sm text-ink-soft">{toast.body}</p>}
        </div>
      ))}
    </div>
  );
}
