import { useMutation, useQueryClient } from '@tanstack/react-query';
import { spraySessionResponseSchema, type UpdateSpraySessionInput } from '../../../shared/schemas/spray-session';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';
import { spraySessionKeys } from './spray-session-keys';

export async function updateSpraySession({ id, changes }: { id: number; changes: UpdateSpraySessionInput }) {
  const { spraySession } = await apiClient.patch(`/api/spray-sessions/${id}`, changes, spraySessionResponseSchema);
  return spraySession;
}

/** Moves, resizes, edits, sprayers given and progress all go through here; what shows the session is fetched again either way. */
export function useUpdateSpraySession() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSpraySession,
    onSuccess: (session) => queryClient.setQueryData(spraySessionKeys.detail(session.id), session),
    onSettled: () => invalidate(queryClient, changedKeys.spraySession()),
  });
}
