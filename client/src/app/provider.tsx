import { MantineProvider } from '@mantine/core';
import { Notifications } from '@mantine/notifications';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { useEffect, useState, type ReactNode } from 'react';
import { restoreSession } from '@/lib/api-client';
import { createQueryClient } from '@/lib/query-client';
import { session } from '@/lib/session';
import { theme } from './theme';

// Whoever signs in next must not see the previous person's cached data.
function useClearCacheOnSignOut(queryClient: QueryClient): void {
  useEffect(
    () =>
      session.subscribe(() => {
        if (session.getState().status === 'signed-out') queryClient.clear();
      }),
    [queryClient],
  );
}

export function AppProvider({ children }: { children: ReactNode }) {
  const [queryClient] = useState(() => createQueryClient());
  useClearCacheOnSignOut(queryClient);
  useEffect(() => {
    void restoreSession();
  }, []);

  return (
    <MantineProvider theme={theme} defaultColorScheme="light">
      <Notifications position="top-right" zIndex={1000} />
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </MantineProvider>
  );
}
