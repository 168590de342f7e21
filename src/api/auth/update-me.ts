import { useMutation, useQueryClient } from '@tanstack/react-query';
import { signedInUserResponseSchema } from '../../../shared/schemas/auth';
import type { UpdateMeInput } from '../../../shared/schemas/user';
import { apiClient } from '../../lib/api-client';
import { authKeys } from './auth-keys';

export async function updateMe(input: UpdateMeInput) {
  const { user } = await apiClient.patch('/api/auth/me', input, signedInUserResponseSchema);
  return user;
}

export function useUpdateMe() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateMe, onSuccess: (user) => queryClient.setQueryData(authKeys.me(), user) });
}
