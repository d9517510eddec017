import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { bookmarkDtoSchema, type BookmarkInput } from '../../../../shared/schemas/bookmark';
import { bookmarkKeys } from './keys';

/** What a bookmark points to: a record or a compound. */
export type BookmarkTarget =
  { recordId: number; compoundId?: undefined } | { compoundId: number; recordId?: undefined };

const addBookmark = (input: BookmarkInput) => api('/api/bookmarks', { method: 'POST', body: input }, bookmarkDtoSchema);

function removeBookmark(target: BookmarkTarget) {
  const params = new URLSearchParams(
    Object.entries(target)
      .filter(([, value]) => value !== undefined)
      .map(([key, value]) => [key, String(value)]),
  );
  return api<void>(`/api/bookmarks?${params}`, { method: 'DELETE' });
}

const updateBookmarkNote = (id: number, note: string | null) =>
  api(`/api/bookmarks/${id}`, { method: 'PATCH', body: { note } }, bookmarkDtoSchema);

/** Adds or removes a bookmark, then re-reads the list (so every toggle and the bookmarks page agree). */
export function useToggleBookmark() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ target, on }: { target: BookmarkTarget; on: boolean }) =>
      on ? addBookmark(target).then(() => undefined) : removeBookmark(target),
    onSettled: () => qc.invalidateQueries({ queryKey: bookmarkKeys.all }),
  });
}

export function useUpdateBookmarkNote() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, note }: { id: number; note: string | null }) => updateBookmarkNote(id, note),
    onSettled: () => qc.invalidateQueries({ queryKey: bookmarkKeys.all }),
  });
}
