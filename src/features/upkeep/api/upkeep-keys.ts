/** Booth upkeep: one booth's record, the booths to choose from, and what is due across the caller's sites. */
export const upkeepKeys = {
  all: ['upkeep'] as const,
  booths: (siteId: number | undefined) => [...upkeepKeys.all, 'booths', siteId ?? 'all'] as const,
  booth: (boothId: number) => [...upkeepKeys.all, 'booth', boothId] as const,
  due: (siteId: number | undefined) => [...upkeepKeys.all, 'due', siteId ?? 'all'] as const,
};
