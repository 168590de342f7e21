export const settingsKeys = {
  all: ['settings'] as const,
  shop: () => [...settingsKeys.all, 'shop'] as const,
};
