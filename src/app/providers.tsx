import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Toaster } from 'sonner';
import { LiveUpdates } from './live-updates';

export function AppProviders({ queryClient, children }: { queryClient: QueryClient; children: ReactNode }) {
  return (
    <QueryClientProvider client={queryClient}>
      <LiveUpdates />
      {children}
      <Toaster position="top-center" richColors closeButton duration={5000} toastOptions={{ style: { fontFamily: 'inherit', fontSize: '1rem' } }} />
    </QueryClientProvider>
  );
}
