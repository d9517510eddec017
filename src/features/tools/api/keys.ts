/** Query keys of the calculators, general to specific. */
export const toolKeys = {
  all: ['tools'] as const,
  columnPlan: (input: unknown) => [...toolKeys.all, 'column-plan', input] as const,
  translation: (input: unknown) => [...toolKeys.all, 'translate-eluent', input] as const,
};
