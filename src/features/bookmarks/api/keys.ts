/** Query keys of the bookmarks feature: one list per signed-in user (the session decides whose). */
export const bookmarkKeys = {
  all: ['bookmarks'] as const,
  list: () => [...bookmarkKeys.all, 'list'] as const,
};
