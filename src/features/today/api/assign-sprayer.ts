import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { spraySessionSchema } from '../../../../shared/schemas/spray-session';
import { apiClient } from '../../../lib/api-client';
import { todayKeys } from './today-keys';

const responseSchema = z.object({ spraySession: spraySessionSchema });

export async function assignSprayer({ sessionId, sprayerId }: { sessionId: number; sprayerId: number | null }) {
  const { spraySession } = await apiClient.patch(`/api/spray-sessions/${sessionId}`, { sprayerId }, responseSchema);
  return spraySession;
}

/** Gives a session to a sprayer (or takes it back) from the day's board. */
export function useAssignSprayer() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: assignSprayer,
    onSettled: () => queryClient.invalidateQueries({ queryKey: todayKeys.all }),
  });
}
