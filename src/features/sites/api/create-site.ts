import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { siteSchema, type CreateSiteInput } from '../../../../shared/schemas/site';
import { apiClient } from '../../../lib/api-client';
import { siteKeys } from './site-keys';

export const siteResponseSchema = z.object({ site: siteSchema });

export async function createSite(input: CreateSiteInput) {
  const { site } = await apiClient.post('/api/sites', input, siteResponseSchema);
  return site;
}

export function useCreateSite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSite,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: siteKeys.all }),
  });
}
