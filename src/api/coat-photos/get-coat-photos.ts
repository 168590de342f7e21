import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { coatPhotoListSchema } from '../../../shared/schemas/coat-photo';
import { apiClient } from '../../lib/api-client';
import { coatPhotoKeys } from './coat-photo-keys';

/** The photos of these coats, with those of the versions each corrects. */
export async function getCoatPhotos(coatIds: number[], signal?: AbortSignal) {
  const query = { coatIds: coatIds.join(',') };
  const { items } = await apiClient.get('/api/coat-photos', coatPhotoListSchema, { query, signal });
  return items;
}

export const coatPhotosQueryOptions = (coatIds: number[]) =>
  queryOptions({
    queryKey: coatPhotoKeys.list(coatIds),
    queryFn: ({ signal }) => getCoatPhotos(coatIds, signal),
    enabled: coatIds.length > 0,
    placeholderData: keepPreviousData,
  });

export function useCoatPhotos(coatIds: number[]) {
  return useQuery(coatPhotosQueryOptions(coatIds));
}
