export const settingsKeys = {
  all: ['settings'] as const,
  lab: () => [...settingsKeys.all, 'lab'] as const,
};
