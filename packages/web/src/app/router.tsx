import { createBrowserRouter, Outlet, type RouteObject } from 'react-router-dom';

import { RouteError } from '@/components/errors/route-error';
import { PageLoader } from '@/components/page-loader';
import type { AreaKey } from '@/lib/authorization';

/** Route metadata read by the signed-in layout: the area a page belongs to decides who may see it. */
export interface RouteHandle {
  area?: AreaKey;
}

const area = (key: AreaKey): RouteHandle => ({ area: key });

/**
 * Every page is its own chunk (route `lazy`), so the sign-in screen loads only what it needs.
 * Route modules export `Component`.
 */
export const routes: RouteObject[] = [
  {
    element: <Outlet />,
    errorElement: <RouteError />,
    hydrateFallbackElement: <PageLoader />,
    children: [
      { path: '/sign-in', lazy: () => import('./routes/sign-in') },
      { path: '/forgot-password', lazy: () => import('./routes/forgot-password') },
      { path: '/reset-password', lazy: () => import('./routes/reset-password') },
      {
        path: '/',
        lazy: () => import('./routes/app/root'),
        children: [
          {
            errorElement: <RouteError />,
            children: [
              { index: true, handle: area('overview'), lazy: () => import('./routes/app/overview') },
              { path: 'projects', handle: area('projects'), lazy: () => import('./routes/app/projects/list') },
              { path: 'projects/:projectId', handle: area('projects'), lazy: () => import('./routes/app/projects/project') },
              { path: 'designs/:designId', handle: area('projects'), lazy: () => import('./routes/app/designs/design') },
              {
                path: 'catalog',
                handle: area('catalog'),
                lazy: () => import('./routes/app/catalog/layout'),
                children: [
                  { index: true, lazy: () => import('./routes/app/catalog/mounts') },
                  // Catalog managers and admins only: the page itself says so to anyone else.
                  { path: 'import', lazy: () => import('./routes/app/catalog/import') },
                  { path: 'suppliers', lazy: () => import('./routes/app/catalog/suppliers') },
                ],
              },
              { path: 'purchasing', handle: area('purchasing'), lazy: () => import('./routes/app/purchasing/queue') },
              {
                path: 'purchasing/designs/:designId',
                handle: area('purchasing'),
                lazy: () => import('./routes/app/purchasing/design'),
              },
              { path: 'admin/users', handle: area('people'), lazy: () => import('./routes/app/admin/users') },
              { path: 'admin/outbox', handle: area('outbox'), lazy: () => import('./routes/app/admin/outbox') },
              { path: 'account', lazy: () => import('./routes/app/account') },
              { path: '*', lazy: () => import('./routes/app/not-found') },
            ],
          },
        ],
      },
    ],
  },
];

export function createAppRouter() {
  return createBrowserRouter(routes);
}
