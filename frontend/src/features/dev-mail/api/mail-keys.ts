export const mailKeys = {
  all: ['dev-mails'] as const,
  list: () => [...mailKeys.all, 'list'] as const,
};
