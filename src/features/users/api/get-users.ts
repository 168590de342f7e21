import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { listSchema, type PageQuery } from '../../../../shared/schemas/common';
import { userSchema } from '../../../../shared/schemas/user';
import { apiClient } from '../../../lib/api-client';
import { userKeys } from './user-keys';

const userListSchema = listSchema(userSchema);

export function getUsers(filters: PageQuery, signal?: AbortSignal) {
  return apiClient.get('/api/users', userListSchema, { query: filters, signal });
}

export const usersQueryOptions = (filters: PageQuery) =>
  queryOptions({
    queryKey: userKeys.list(filters),
    queryFn: ({ signal }) => getUsers(filters, signal),
    placeholderData: keepPreviousData,
  });

export function useUsers(filters: PageQuery) {
  return useQuery(usersQueryOptions(filters));
}
