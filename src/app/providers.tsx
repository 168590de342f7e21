import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { LiveUpdates } from './live-updates';
import { BoothwrightToaster } from './toaster';

export function AppProviders({ queryClient, children }: { queryClient: QueryClient; children: ReactNode }) {
  return (
    <QueryClientProvider client={queryClient}>
      <LiveUpdates />
      {children}
      <BoothwrightToaster />
    </QueryClientProvider>
  );
}
