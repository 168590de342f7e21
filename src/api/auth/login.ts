import { useMutation, useQueryClient } from '@tanstack/react-query';
import { signedInUserResponseSchema, type LoginInput } from '../../../shared/schemas/auth';
import { apiClient, refreshCsrfToken } from '../../lib/api-client';
import { forgetSavedCopies } from '../../lib/saved-copy';
import { authKeys } from './auth-keys';

export async function login(input: LoginInput) {
  const { user } = await apiClient.post('/api/auth/login', input, signedInUserResponseSchema);
  return user;
}

export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: [...authKeys.all, 'login'],
    mutationFn: login,
    onSuccess: async (user) => {
      // A new sign-in session: drop anything cached for whoever was here before.
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
      queryClient.setQueryData(authKeys.me(), user);
      await Promise.all([refreshCsrfToken(), forgetSavedCopies(), queryClient.invalidateQueries({ queryKey: authKeys.me() })]);
    },
  });
}
