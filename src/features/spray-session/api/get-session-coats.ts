import { queryOptions, useQuery } from '@tanstack/react-query';
import { coatSchema } from '../../../../shared/schemas/coat';
import { listSchema } from '../../../../shared/schemas/common';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

const coatListSchema = listSchema(coatSchema);

export function getSessionCoats(sessionId: number, signal?: AbortSignal) {
  return apiClient.get('/api/coats', coatListSchema, { query: { spraySessionId: sessionId, pageSize: 200 }, signal });
}

/** The session's current coat records, newest first. */
export const sessionCoatsQueryOptions = (sessionId: number) =>
  queryOptions({ queryKey: spraySessionKeys.coats(sessionId), queryFn: ({ signal }) => getSessionCoats(sessionId, signal) });

export function useSessionCoats(sessionId: number) {
  return useQuery(sessionCoatsQueryOptions(sessionId));
}
