export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
};

/** Kept apart from `authKeys`: sign-in keeps the auth keys, but someone else's notifications must go. */
export const myNotificationKeys = {
  all: ['my-notifications'] as const,
  recent: () => [...myNotificationKeys.all, 'recent'] as const,
};
