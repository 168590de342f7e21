import type { QueryClient, QueryKey } from '@tanstack/react-query';

/** Marks every query under these prefixes stale: those on screen refetch now, the rest at their next use. */
export function invalidate(queryClient: QueryClient, keys: readonly QueryKey[]): Promise<void> {
  return Promise.all(keys.map((queryKey) => queryClient.invalidateQueries({ queryKey }))).then(() => undefined);
}
