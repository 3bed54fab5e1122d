import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { AppTheme } from '@/components/ui/app-theme';

/** Everything the pages rely on: the theme and the app's one query cache. */
export function AppProvider({
  queryClient,
  children,
}: {
  queryClient: QueryClient;
  children: ReactNode;
}) {
  return (
    <AppTheme>
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </AppTheme>
  );
}
