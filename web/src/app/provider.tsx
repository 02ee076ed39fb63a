import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { AppToaster } from '@/components/app-toaster';
import { queryClient as appQueryClient } from '@/lib/query-client';
import { ThemeChoiceProvider } from './theme/theme-choice';

export interface AppProvidersProps {
  readonly children: ReactNode;
  /** Tests pass their own client so each starts with an empty cache. */
  readonly queryClient?: QueryClient;
}

export function AppProviders({ children, queryClient = appQueryClient }: AppProvidersProps) {
  return (
    <ThemeChoiceProvider>
      <QueryClientProvider client={queryClient}>
        {children}
        <AppToaster />
      </QueryClientProvider>
    </ThemeChoiceProvider>
  );
}
