import { queryOptions, useQuery } from '@tanstack/react-query';
import { listSchema } from '../../../../shared/schemas/common';
import { finishSystemSchema } from '../../../../shared/schemas/finish-system';
import { apiClient } from '../../../lib/api-client';
import { jobKeys } from './job-keys';

const finishSystemListSchema = listSchema(finishSystemSchema);

/** Every finish system, for the job form's select (a shop has a handful, never hundreds). */
export function getFinishSystemChoices(signal?: AbortSignal) {
  return apiClient.get('/api/finish-systems', finishSystemListSchema, { query: { pageSize: 200 }, signal });
}

export const finishSystemChoicesQueryOptions = () =>
  queryOptions({ queryKey: jobKeys.finishSystemChoices(), queryFn: ({ signal }) => getFinishSystemChoices(signal), staleTime: 5 * 60_000 });

export function useFinishSystemChoices() {
  return useQuery(finishSystemChoicesQueryOptions());
}
