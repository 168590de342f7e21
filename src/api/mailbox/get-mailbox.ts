import { queryOptions, useQuery } from '@tanstack/react-query';
import { mailboxSchema } from '../../../shared/schemas/notification';
import { apiClient, isApiError } from '../../lib/api-client';
import { mailboxKeys } from './mailbox-keys';

/** What the development mail server has caught. Answers 404 when real SMTP is configured. */
export function getMailbox(signal?: AbortSignal) {
  return apiClient.get('/api/mailbox', mailboxSchema, { signal });
}

/** A 404 here is an answer (real SMTP is set, so there is no mailbox), not a passing fault. */
export function isNoMailbox(error: unknown): boolean {
  return isApiError(error) && error.status === 404;
}

export const mailboxQueryOptions = () =>
  queryOptions({
    queryKey: mailboxKeys.messages(),
    queryFn: ({ signal }) => getMailbox(signal),
    refetchInterval: (query) => (isNoMailbox(query.state.error) ? false : 10_000),
    retry: (failureCount, error) => !isNoMailbox(error) && failureCount < 2,
  });

export function useMailbox() {
  return useQuery(mailboxQueryOptions());
}
