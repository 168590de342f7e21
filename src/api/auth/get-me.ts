import { queryOptions, useQuery } from '@tanstack/react-query';
import { signedInUserResponseSchema, type SignedInUser } from '../../../shared/schemas/auth';
import { apiClient, isApiError } from '../../lib/api-client';
import { authKeys } from './auth-keys';

/** The signed-in user, or null when nobody is signed in (401 is an answer here, not a failure). */
export async function getMe(): Promise<SignedInUser | null> {
  try {
    const { user } = await apiClient.get('/api/auth/me', signedInUserResponseSchema);
    return user;
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: authKeys.me(), queryFn: getMe, staleTime: 5 * 60_000 });

export function useMe() {
  return useQuery(meQueryOptions());
}
