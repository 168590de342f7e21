import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateSpraySessionInput } from '../../../../shared/schemas/spray-session';
import { apiClient } from '../../../lib/api-client';
import { spraySessionResponseSchema } from './get-spray-session';
import { spraySessionKeys } from './spray-session-keys';

export async function updateSpraySession({ id, changes }: { id: number; changes: UpdateSpraySessionInput }) {
  const { spraySession } = await apiClient.patch(`/api/spray-sessions/${id}`, changes, spraySessionResponseSchema);
  return spraySession;
}

export function useUpdateSpraySession() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSpraySession,
    onSuccess: (session) => {
      queryClient.setQueryData(spraySessionKeys.detail(session.id), session);
      return queryClient.invalidateQueries({ queryKey: spraySessionKeys.lists() });
    },
  });
}
