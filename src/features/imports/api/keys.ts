/** Query keys of the import page, general to specific. */
export const importKeys = {
  all: ['imports'] as const,
  list: () => [...importKeys.all, 'list'] as const,
  detail: (id: number) => [...importKeys.all, 'detail', id] as const,
};

/**
 * Records, search, compounds, classes and the home page's counts (query key ['overview']) read under these
 * prefixes; an import or its undo changes them. tests/client/imports-keys.test.ts checks each prefix matches
 * a key the other features really use.
 */
export const changedByImports = [['records'], ['search'], ['compounds'], ['classes'], ['overview']] as const;
