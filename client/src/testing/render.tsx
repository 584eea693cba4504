import { MantineProvider } from '@mantine/core';
import { Notifications } from '@mantine/notifications';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactElement } from 'react';
import { MemoryRouter, useLocation } from 'react-router-dom';
import { theme } from '@/app/theme';
import { createQueryClient } from '@/lib/query-client';

interface RenderOptions {
  route?: string;
  queryClient?: QueryClient;
}

/**
 * Renders as the app does: Mantine with Keenroute's theme (its test mode turns transitions off), a router at
 * `route`, and a fresh QueryClient.
 */
export function renderWithProviders(ui: ReactElement, { route = '/', queryClient }: RenderOptions = {}) {
  const client = queryClient ?? createQueryClient({ retry: false });
  const user = userEvent.setup();
  const result = render(
    <MantineProvider theme={theme} env="test">
      <Notifications />
      <QueryClientProvider client={client}>
        <MemoryRouter initialEntries={[route]}>{ui}</MemoryRouter>
      </QueryClientProvider>
    </MantineProvider>,
  );
  return { user, queryClient: client, ...result };
}

/** Shows where the router is, so a test can check where a screen sent the person. */
export function LocationProbe() {
  const location = useLocation();
  return <output data-testid="location">{`${location.pathname}${location.search}`}</output>;
}
