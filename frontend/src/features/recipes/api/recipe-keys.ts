export const recipeKeys = {
  all: ['recipes'] as const,
  list: () => [...recipeKeys.all, 'list'] as const,
  detail: (id: number) => [...recipeKeys.all, 'detail', id] as const,
  version: (id: number) => [...recipeKeys.all, 'version', id] as const,
  // The records the builder's pickers and live checks read (inks, substrates, equipment).
  records: () => [...recipeKeys.all, 'records'] as const,
  file: (id: number) => [...recipeKeys.all, 'file', id] as const,
};
