import { useMutation, useQueryClient } from '@tanstack/react-query';
import { siteResponseSchema, type UpdateSiteInput } from '../../../shared/schemas/site';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

export async function updateSite({ id, changes }: { id: number; changes: UpdateSiteInput }) {
  const { site } = await apiClient.patch(`/api/sites/${id}`, changes, siteResponseSchema);
  return site;
}

export function useUpdateSite() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateSite, onSuccess: () => invalidate(queryClient, changedKeys.site()) });
}
