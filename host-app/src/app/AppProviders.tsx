import { Theme } from '@radix-ui/themes';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';

export interface AppProvidersProps {
  queryClient: QueryClient;
  children: ReactNode;
}

/** Theme and data cache around the whole app (and around every test render). */
export function AppProviders({ queryClient, children }: AppProvidersProps) {
  return (
    <QueryClientProvider client={queryClient}>
      <Theme accentColor="teal" grayColor="sand" radius="medium" scaling="100%" panelBackground="solid" appearance="light">
        {children}
      </Theme>
    </QueryClientProvider>
  );
}
