import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { userListSchema } from '../../../shared/schemas/user';
import { apiClient } from '../../lib/api-client';
import { userKeys, type UserFilters } from './user-keys';

export function getUsers(filters: UserFilters, signal?: AbortSignal) {
  return apiClient.get('/api/users', userListSchema, { query: filters, signal });
}

export const usersQueryOptions = (filters: UserFilters) =>
  queryOptions({
    queryKey: userKeys.list(filters),
    queryFn: ({ signal }) => getUsers(filters, signal),
    placeholderData: keepPreviousData,
  });

export function useUsers(filters: UserFilters) {
  return useQuery(usersQueryOptions(filters));
}
