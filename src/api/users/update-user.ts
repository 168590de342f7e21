import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userResponseSchema, type UpdateUserInput } from '../../../shared/schemas/user';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

export async function updateUser({ id, changes }: { id: number; changes: UpdateUserInput }) {
  const { user } = await apiClient.patch(`/api/users/${id}`, changes, userResponseSchema);
  return user;
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateUser, onSuccess: () => invalidate(queryClient, changedKeys.user()) });
}
