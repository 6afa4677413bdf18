export const authKeys = {
  all: ['auth'] as const,
  token: (token: string) => [...authKeys.all, 'token', token] as const,
};
