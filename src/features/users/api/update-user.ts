import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateUserInput } from '../../../../shared/schemas/user';
import { apiClient } from '../../../lib/api-client';
import { userEnvelopeSchema } from './create-user';
import { userKeys } from './user-keys';

export async function updateUser({ id, changes }: { id: number; changes: UpdateUserInput }) {
  const { user } = await apiClient.patch(`/api/users/${id}`, changes, userEnvelopeSchema);
  return user;
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.lists() }),
  });
}
