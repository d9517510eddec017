/** Query keys of the curation screens, general to specific. */
export const curationKeys = {
  all: ['curation'] as const,
  duplicates: () => [...curationKeys.all, 'duplicates'] as const,
  preview: (ids: readonly number[]) => [...curationKeys.all, 'preview', [...ids]] as const,
  merges: (recordId?: number) => [...curationKeys.all, 'merges', recordId ?? 'all'] as const,
};

/** Records pages read under this prefix; curation changes records, so it invalidates them too. */
export const recordsKey = ['records'] as const;
