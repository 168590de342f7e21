import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequestNoContent, refreshCsrfToken } from '../../lib/api-client';
import { forgetSavedCopies } from '../../lib/saved-copy';
import { authKeys } from './auth-keys';

export async function logout(): Promise<void> {
  await apiRequestNoContent('POST', '/api/auth/logout');
}

export function useLogout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: logout,
    onSettled: async () => {
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), null);
      await Promise.all([refreshCsrfToken().catch(() => undefined), forgetSavedCopies()]);
    },
  });
}
