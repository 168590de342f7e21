export const mailboxKeys = {
  all: ['mailbox'] as const,
  messages: () => [...mailboxKeys.all, 'messages'] as const,
};
