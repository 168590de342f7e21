import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { upkeepKeys } from './upkeep-keys';

/**
 * Every upkeep write changes the booth's record and what is due, so each refreshes all of
 * upkeep. `send` names the call; the response schema checks the answer.
 */
export function useUpkeepWrite<I, S extends z.ZodType>(send: (input: I) => { method: 'post' | 'patch'; path: string; body: unknown }, schema: S) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: I) => {
      const { method, path, body } = send(input);
      return method === 'post' ? apiClient.post(path, body, schema) : apiClient.patch(path, body, schema);
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: upkeepKeys.all }),
  });
}
