import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { coatPhotoSchema } from '../../../../shared/schemas/coat-photo';
import { apiClient } from '../../../lib/api-client';
import { coatLogKeys } from './coat-log-keys';

const responseSchema = z.object({ items: z.array(coatPhotoSchema) });

/** The photos of the coats on one page of the log, with those of the versions each corrects. */
export async function getCoatPhotos(coatIds: number[], signal?: AbortSignal) {
  return (await apiClient.get('/api/coat-photos', responseSchema, { query: { coatIds: coatIds.join(',') }, signal })).items;
}

export const coatPhotosQueryOptions = (coatIds: number[]) =>
  queryOptions({ queryKey: [...coatLogKeys.photos(), coatIds], queryFn: ({ signal }) => getCoatPhotos(coatIds, signal), enabled: coatIds.length > 0, placeholderData: keepPreviousData });

export function useCoatPhotos(coatIds: number[]) {
  return useQuery(coatPhotosQueryOptions(coatIds));
}
