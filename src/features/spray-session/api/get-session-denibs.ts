import { queryOptions, useQuery } from '@tanstack/react-query';
import { listSchema } from '../../../../shared/schemas/common';
import { denibSchema } from '../../../../shared/schemas/denib';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

const denibListSchema = listSchema(denibSchema);

export function getSessionDenibs(sessionId: number, signal?: AbortSignal) {
  return apiClient.get('/api/denibs', denibListSchema, { query: { spraySessionId: sessionId, pageSize: 200 }, signal });
}

/** The denibs recorded on the session, newest first. */
export const sessionDenibsQueryOptions = (sessionId: number) =>
  queryOptions({ queryKey: spraySessionKeys.denibs(sessionId), queryFn: ({ signal }) => getSessionDenibs(sessionId, signal) });

export function useSessionDenibs(sessionId: number) {
  return useQuery(sessionDenibsQueryOptions(sessionId));
}
