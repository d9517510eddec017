/** Query keys of the compound-class pages. */
export const classKeys = {
  all: ['classes'] as const,
  index: () => [...classKeys.all, 'index'] as const,
  detail: (key: string) => [...classKeys.all, 'detail', key] as const,
};
