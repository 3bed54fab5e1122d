import { QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactElement } from 'react';
import { AppTheme } from '@/components/ui/app-theme';
import { createQueryClient } from '@/lib/query-client';

/** Renders a component inside the app's theme and a fresh query cache with the app's defaults. */
export function renderWithProviders(ui: ReactElement) {
  const queryClient = createQueryClient();
  const view = render(
    <AppTheme>
      <QueryClientProvider client={queryClient}>{ui}</QueryClientProvider>
    </AppTheme>,
  );
  return { ...view, queryClient };
}
