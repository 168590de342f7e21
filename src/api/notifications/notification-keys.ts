/** Kept apart from the auth keys: sign-in keeps those, but someone else's notifications must go. */
export const notificationKeys = {
  all: ['notifications'] as const,
  mine: () => [...notificationKeys.all, 'mine'] as const,
};
