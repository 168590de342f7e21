/** Photos of coats, asked for by the coats on one page of the log. */
export const coatPhotoKeys = {
  all: ['coat-photos'] as const,
  lists: () => [...coatPhotoKeys.all, 'list'] as const,
  list: (coatIds: number[]) => [...coatPhotoKeys.lists(), coatIds] as const,
};
