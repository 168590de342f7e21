import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { readingSchema, type CreateReadingInput } from '../../../../shared/schemas/reading';
import { apiClient } from '../../../lib/api-client';
import { spraySessionKeys } from './spray-session-keys';

const readingResponseSchema = z.object({ reading: readingSchema });

export async function createReading(input: CreateReadingInput) {
  const { reading } = await apiClient.post('/api/readings', input, readingResponseSchema);
  return reading;
}

/** The conditions typed into the checklist also go into the booth's readings log. */
export function useCreateReading() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createReading,
    onSuccess: (reading) => {
      if (reading.boothId) queryClient.setQueryData(spraySessionKeys.latestReading(reading.boothId), reading);
    },
  });
}
