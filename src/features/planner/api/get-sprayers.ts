import { queryOptions, useQuery } from '@tanstack/react-query';
import { listSchema } from '../../../../shared/schemas/common';
import { userSchema } from '../../../../shared/schemas/user';
import { apiClient } from '../../../lib/api-client';
import { plannerKeys } from './planner-keys';

const userListSchema = listSchema(userSchema);

export function getUsers(signal?: AbortSignal) {
  return apiClient.get('/api/users', userListSchema, { query: { page: 1, pageSize: 200 }, signal });
}

/**
 * People who can be put on a session: active sprayers and leads. The user list is the owner's
 * alone (users:read), so other roles do not ask; a lighter sprayer list would serve leads too.
 */
export const sprayersQueryOptions = (enabled: boolean) =>
  queryOptions({
    queryKey: plannerKeys.sprayers(),
    queryFn: ({ signal }) => getUsers(signal),
    select: (list) => list.items.filter((user) => !user.disabled && (user.role === 'sprayer' || user.role === 'lead')),
    staleTime: 5 * 60_000,
    enabled,
  });

export function useSprayers(enabled: boolean) {
  return useQuery(sprayersQueryOptions(enabled));
}
