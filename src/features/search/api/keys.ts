/** Query keys of the search feature, general to specific. */
export const searchKeys = {
  all: ['search'] as const,
  results: (query: string) => [...searchKeys.all, 'results', query] as const,
  contributors: () => [...searchKeys.all, 'contributors'] as const,
};
