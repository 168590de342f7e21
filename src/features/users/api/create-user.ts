import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { userSchema, type CreateUserInput } from '../../../../shared/schemas/user';
import { apiClient } from '../../../lib/api-client';
import { userKeys } from './user-keys';

export const userEnvelopeSchema = z.object({ user: userSchema });

export async function createUser(input: CreateUserInput) {
  const { user } = await apiClient.post('/api/users', input, userEnvelopeSchema);
  return user;
}

export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.lists() }),
  });
}
