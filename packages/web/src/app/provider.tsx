import { BlueprintProvider } from '@blueprintjs/core';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';

import { AuthProvider } from '@/lib/auth';
import { queryClient as appQueryClient } from '@/lib/query-client';

export interface AppProviderProps {
  children: ReactNode;
  /** Tests pass a fresh client; the app uses the shared one. */
  queryClient?: QueryClient;
}

/** Everything a screen needs around it: data cache, Blueprint's context, the session. */
export function AppProvider({ children, queryClient = appQueryClient }: AppProviderProps) {
  return (
    <QueryClientProvider client={queryClient}>
      <BlueprintProvider>
        <AuthProvider>{children}</AuthProvider>
      </BlueprintProvider>
    </QueryClientProvider>
  );
}
