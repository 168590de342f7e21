import type { ReactNode } from 'react';
import { errorMessage } from '../../lib/error-messages';
import { Button } from './button';

export function LoadingState({ what }: { what: string }) {
  return (
    <p role="status" className="rounded-panel border border-dashed border-maple-300 bg-white p-6 text-maple-700">
      Loading {what}…
    </p>
  );
}

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded-panel border border-dashed border-maple-400 bg-white p-6">
      <p className="text-lg font-semibold">{title}</p>
      {children && <div className="mt-2 text-maple-700">{children}</div>}
    </div>
  );
}

export function ErrorState({ error, what, onRetry }: { error: unknown; what: string; onRetry?: () => void }) {
  return (
    <div role="alert" className="rounded-panel border-2 border-verdict-stop bg-white p-4">
      <p className="font-semibold text-verdict-stop">Could not load {what}.</p>
      <p className="mt-1">{errorMessage(error)}</p>
      {onRetry && (
        <Button variant="secondary" className="mt-3" onClick={onRetry}>
          Try again
        </Button>
      )}
    </div>
  );
}
