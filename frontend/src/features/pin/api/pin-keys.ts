export const pinKeys = {
  all: ['pin'] as const,
  users: () => [...pinKeys.all, 'users'] as const,
};
