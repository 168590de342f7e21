import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userResponseSchema, type CreateUserInput } from '../../../shared/schemas/user';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

export async function createUser(input: CreateUserInput) {
  const { user } = await apiClient.post('/api/users', input, userResponseSchema);
  return user;
}

export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createUser, onSuccess: () => invalidate(queryClient, changedKeys.user()) });
}
