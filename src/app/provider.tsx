import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { Toaster } from 'sonner';
import { AppErrorFallback } from '@/components/errors/app-error-fallback';
import { ErrorBoundary } from '@/components/errors/error-boundary';
import { createQueryClient } from '@/lib/react-query';

export type AppProviderProps = {
  children: ReactNode;
  /** Tests pass their own client (retries off); the app makes one. */
  queryClient?: QueryClient;
};

export function AppProvider({ children, queryClient }: AppProviderProps) {
  const [client] = useState(() => queryClient ?? createQueryClient());
  return (
    <ErrorBoundary fallback={() => <AppErrorFallback />}>
      <QueryClientProvider client={client}>
        {children}
        {/* sonner's region is aria-live="polite", so toasts are announced. */}
        <Toaster position="bottom-right" richColors closeButton theme="light" />
      </QueryClientProvider>
    </ErrorBoundary>
  );
}
