import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateSiteInput } from '../../../../shared/schemas/site';
import { apiClient } from '../../../lib/api-client';
import { siteResponseSchema } from './create-site';
import { siteKeys } from './site-keys';

export async function updateSite({ id, changes }: { id: number; changes: UpdateSiteInput }) {
  const { site } = await apiClient.patch(`/api/sites/${id}`, changes, siteResponseSchema);
  return site;
}

export function useUpdateSite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSite,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: siteKeys.all }),
  });
}
