import { Theme } from '@radix-ui/themes';
import type { ReactNode } from 'react';

/** Overshoot's look: dark neutral grey with a single warm amber accent. */
export function AppTheme({ children }: { children: ReactNode }) {
  return (
    <Theme
      appearance="dark"
      grayColor="gray"
      accentColor="amber"
      radius="small"
      panelBackground="solid"
    >
      {children}
    </Theme>
  );
}
