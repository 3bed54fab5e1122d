import { QueryClientProvider } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { AppTheme } from '@/components/ui/app-theme';
import { createQueryClient } from '@/lib/query-client';

/** Everything the pages rely on: the theme and one query cache for the app's lifetime. */
export function AppProvider({ children }: { children: ReactNode }) {
  const [queryClient] = useState(createQueryClient);
  return (
    <AppTheme>
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </AppTheme>
  );
}
