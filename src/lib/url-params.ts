import { useCallback } from 'react';
import { useSearchParams } from 'react-router-dom';

export type UrlChanges = Record<string, string | number | null | undefined>;

/**
 * Sets or clears some URL parameters (empty values clear) and, unless told otherwise, returns to page 1.
 * Reads the address bar rather than React Router's copy: two quick changes before a re-render must both stick.
 */
export function useUrlUpdater() {
  const [, setParams] = useSearchParams();
  return useCallback(
    (changes: UrlChanges, resetPage = true) => {
      setParams(() => {
        const next = new URLSearchParams(window.location.search);
        for (const [key, value] of Object.entries(changes)) {
          if (value === null || value === undefined || value === '') next.delete(key);
          else next.set(key, String(value));
        }
        if (resetPage && !('page' in changes)) next.delete('page');
        return next;
      });
    },
    [setParams],
  );
}
