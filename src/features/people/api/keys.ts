/** Query keys of the people pages, general to specific. */
export const peopleKeys = {
  all: ['people'] as const,
  users: () => [...peopleKeys.all, 'users'] as const,
  invitations: (status: 'open' | 'all') => [...peopleKeys.all, 'invitations', status] as const,
};
