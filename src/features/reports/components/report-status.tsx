import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { ErrorState, LoadingState } from '../../../components/ui/states';
import { isApiError } from '../../../lib/api-client';

interface ReportStatusProps<T> {
  query: UseQueryResult<T>;
  what: string;
  children: (data: T) => ReactNode;
}

/** Loading and error for one report; the error shows the server's own words and any field messages. */
export function ReportStatus<T>({ query, what, children }: ReportStatusProps<T>) {
  if (query.isPending) return <LoadingState what={what} />;
  if (query.isError) {
    const fields = isApiError(query.error) ? Object.values(query.error.fields) : [];
    return (
      <div className="space-y-2">
        <ErrorState error={query.error} what={what} onRetry={() => query.refetch()} />
        {fields.length > 0 && (
          <ul className="list-inside list-disc text-verdict-stop">
            {fields.map((message) => (
              <li key={message}>{message}</li>
            ))}
          </ul>
        )}
      </div>
    );
  }
  return children(query.data);
}
