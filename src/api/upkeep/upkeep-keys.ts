/** Booth upkeep: one booth's record, and what is due across the caller's sites (or one site). */
export const upkeepKeys = {
  all: ['upkeep'] as const,
  booths: () => [...upkeepKeys.all, 'booth'] as const,
  booth: (boothId: number) => [...upkeepKeys.booths(), boothId] as const,
  due: (siteId: number | undefined) => [...upkeepKeys.all, 'due', siteId ?? 'all'] as const,
};
