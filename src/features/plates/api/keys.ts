export const plateKeys = {
  all: ['plates'] as const,
  annotation: (photoId: number) => ['plates', 'annotation', photoId] as const,
  revisions: (photoId: number) => ['plates', 'annotation', photoId, 'revisions'] as const,
};
