export const sprayerKeys = {
  all: ['sprayers'] as const,
  lists: () => [...sprayerKeys.all, 'list'] as const,
  list: (boothId: number) => [...sprayerKeys.lists(), { boothId }] as const,
};
