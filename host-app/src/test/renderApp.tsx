import { render } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { AppProviders } from '@/app/AppProviders';
import { appRouteObjects } from '@/app/appRouteObjects';
import { createQueryClient } from '@/app/createQueryClient';
import { useSignOutStore } from '@/stores/useSignOutStore';

/** The real route tree and providers at one URL, with a fresh cache and stores per test. */
export function renderApp(url: string) {
  useSignOutStore.getState().clear();
  const queryClient = createQueryClient();
  queryClient.setDefaultOptions({ queries: { retry: false }, mutations: { retry: false } });
  const router = createMemoryRouter(appRouteObjects, { initialEntries: [url] });
  const view = render(
    <AppProviders queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProviders>,
  );
  return { ...view, router, queryClient };
}
