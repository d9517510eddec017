import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { bookmarkListSchema } from '../../../../shared/schemas/bookmark';
import { bookmarkKeys } from './keys';

const getBookmarks = () => api('/api/bookmarks', {}, bookmarkListSchema);

const bookmarksQueryOptions = queryOptions({
  queryKey: bookmarkKeys.list(),
  queryFn: getBookmarks,
  staleTime: 30_000,
});

/** The signed-in user's bookmarks, newest first; every toggle on a page shares this one request. */
export function useBookmarks() {
  return useQuery(bookmarksQueryOptions);
}
