import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateSpraySessionInput } from '../../../../shared/schemas/spray-session';
import { apiClient } from '../../../lib/api-client';
import { sessionResponseSchema } from './create-spray-session';
import { plannerKeys } from './planner-keys';

export async function updateSpraySession({ id, changes }: { id: number; changes: UpdateSpraySessionInput }) {
  const { spraySession } = await apiClient.patch(`/api/spray-sessions/${id}`, changes, sessionResponseSchema);
  return spraySession;
}

/** Moves, resizes, edits and cancels all go through here; the list is fetched again either way. */
export function useUpdateSpraySession() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSpraySession,
    onSettled: () => queryClient.invalidateQueries({ queryKey: plannerKeys.sessions() }),
  });
}
