import { useMutation, useQueryClient } from '@tanstack/react-query';
import { siteResponseSchema, type CreateSiteInput } from '../../../shared/schemas/site';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

export async function createSite(input: CreateSiteInput) {
  const { site } = await apiClient.post('/api/sites', input, siteResponseSchema);
  return site;
}

export function useCreateSite() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createSite, onSuccess: () => invalidate(queryClient, changedKeys.site()) });
}
