import { queryOptions, useQuery } from '@tanstack/react-query';
import { spraySessionResponseSchema, type SpraySession } from '../../../shared/schemas/spray-session';
import { apiClient } from '../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

export async function getSpraySession(id: number, signal?: AbortSignal) {
  const { spraySession } = await apiClient.get(`/api/spray-sessions/${id}`, spraySessionResponseSchema, { signal });
  return spraySession;
}

export const spraySessionQueryOptions = (id: number) =>
  queryOptions({ queryKey: spraySessionKeys.detail(id), queryFn: ({ signal }) => getSpraySession(id, signal) });

/** `shown`: the copy a list already has, shown at once while the session itself loads. */
export function useSpraySession(id: number, shown?: SpraySession) {
  return useQuery({ ...spraySessionQueryOptions(id), placeholderData: shown });
}
