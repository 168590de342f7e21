import { queryOptions, useQuery } from '@tanstack/react-query';
import { signInStateResponseSchema, type SignedInUser } from '../../../shared/schemas/auth';
import { apiClient } from '../../lib/api-client';
import { authKeys } from './auth-keys';

/**
 * The signed-in user, or null when nobody is signed in. Asked of the public sign-in state, so a
 * signed-out browser makes no request that is refused (no 401 in its console before sign-in).
 */
export async function getMe(): Promise<SignedInUser | null> {
  const { user } = await apiClient.get('/api/auth/session', signInStateResponseSchema);
  return user;
}

export const meQueryOptions = () => queryOptions({ queryKey: authKeys.me(), queryFn: getMe, staleTime: 5 * 60_000 });

export function useMe() {
  return useQuery(meQueryOptions());
}
