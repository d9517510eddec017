/** Query keys of the import page, general to specific. */
export const importKeys = {
  all: ['imports'] as const,
  list: () => [...importKeys.all, 'list'] as const,
  detail: (id: number) => [...importKeys.all, 'detail', id] as const,
};

/** Records and search read under these prefixes; an import or its undo changes them. */
export const changedByImports = [['records'], ['search'], ['compounds'], ['classes'], ['home']] as const;
