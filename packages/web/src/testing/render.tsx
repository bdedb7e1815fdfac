import { QueryClient } from '@tanstack/react-query';
import { render, type RenderResult } from '@testing-library/react';
import userEvent, { type UserEvent } from '@testing-library/user-event';
import type { ReactElement } from 'react';
import { createMemoryRouter, RouterProvider, type RouteObject } from 'react-router-dom';

import { AppProvider } from '@/app/provider';
import { routes as appRoutes } from '@/app/router';
import { meQueryKey, type SessionUser } from '@/lib/auth';
import type { Role } from '@/lib/authorization';
import { setToken } from '@/lib/session';

import { TEST_USERS } from './factories';

export const TEST_TOKEN = 'test-token';

export interface RenderOptions {
  /** Signed in as this role (one of `TEST_USERS`) or this user; `null` or absent: signed out. */
  signedInAs?: Role | SessionUser | null;
  /** The address the app starts at. */
  path?: string;
}

export interface RenderAppResult extends RenderResult {
  router: ReturnType<typeof createMemoryRouter>;
  queryClient: QueryClient;
  user: UserEvent;
  /** The signed-in user, if any. */
  sessionUser: SessionUser | null;
}

/** A query client for one test: no retries, nothing shared with other tests. */
export function createTestQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { retry: false, gcTime: Infinity, staleTime: Infinity },
      mutations: { retry: false },
    },
  });
}

function resolveUser(signedInAs: RenderOptions['signedInAs']): SessionUser | null {
  if (!signedInAs) return null;
  return typeof signedInAs === 'string' ? TEST_USERS[signedInAs] : signedInAs;
}

function renderRoutes(routes: RouteObject[], { signedInAs, path = '/' }: RenderOptions): RenderAppResult {
  const sessionUser = resolveUser(signedInAs);
  const queryClient = createTestQueryClient();
  if (sessionUser) {
    setToken(TEST_TOKEN);
    queryClient.setQueryData(meQueryKey, sessionUser);
  }
  const router = createMemoryRouter(routes, { initialEntries: [path] });
  const user = userEvent.setup();
  const result = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...result, router, queryClient, user, sessionUser };
}

/** The whole app (real routes, lazy pages, guards) at `path`. */
export function renderApp(options: RenderOptions = {}): RenderAppResult {
  return renderRoutes(appRoutes, options);
}

/** One component inside the app's providers and a router, e.g. a feature component. */
export function renderWithProviders(ui: ReactElement, options: RenderOptions = {}): RenderAppResult {
  const path = options.path ?? '/';
  return renderRoutes([{ path: '*', element: ui }], { ...options, path });
}
