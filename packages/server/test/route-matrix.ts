import type { Role } from '../src/common/roles.js';

/**
 * Who may call which API route. The matrix test calls every route as each role and as an
 * anonymous caller, and fails when a registered /api route is missing here (or a row names a
 * route that no longer exists). A feature module adds one row per route it registers.
 *
 * - `public`: anyone, signed in or not;
 * - `signed-in`: any signed-in role;
 * - a list of roles: those roles (admin passes every @Roles check; list it anyway).
 *
 * Requests are sent with `body` (default `{}`) to the `path` with every `:param` replaced by
 * `999999`, an id that does not exist: an allowed caller gets 2xx or a 4xx from validation
 * or lookup, never 401/403, and nothing is changed.
 */
export type Access = 'public' | 'signed-in' | readonly Role[];

export type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export interface RouteRule {
  method: Method;
  /** As registered with Express, e.g. `/api/users/:id`. */
  path: string;
  access: Access;
  body?: object;
}

export const ROUTE_MATRIX: readonly RouteRule[] = [
  // health
  { method: 'GET', path: '/api/health', access: 'public' },

  // API documentation (served by SwaggerModule)
  { method: 'GET', path: '/api/docs', access: 'public' },
  { method: 'GET', path: '/api/docs-json', access: 'public' },
  { method: 'GET', path: '/api/docs-yaml', access: 'public' },

  // auth
  { method: 'POST', path: '/api/auth/login', access: 'public' },
  { method: 'GET', path: '/api/auth/me', access: 'signed-in' },
  { method: 'PATCH', path: '/api/auth/me', access: 'signed-in' },
  { method: 'POST', path: '/api/auth/me/password', access: 'signed-in' },
  { method: 'POST', path: '/api/auth/password-reset', access: 'public', body: { email: 'nobody@example.test' } },
  {
    method: 'POST',
    path: '/api/auth/password-reset/confirm',
    access: 'public',
    body: { token: 'no-such-token', password: 'long enough 1' },
  },

  // mail outbox (demo and test mode; the local mail catcher's messages)
  { method: 'GET', path: '/api/outbox', access: ['admin'] },
  { method: 'GET', path: '/api/outbox/:id', access: ['admin'] },
  { method: 'GET', path: '/api/outbox/:id/attachments/:index', access: ['admin'] },

  // users
  { method: 'GET', path: '/api/users', access: ['admin'] },
  { method: 'POST', path: '/api/users', access: ['admin'] },
  { method: 'GET', path: '/api/users/:id', access: ['admin'] },
  { method: 'PATCH', path: '/api/users/:id', access: ['admin'] },
  { method: 'DELETE', path: '/api/users/:id', access: ['admin'] },
  { method: 'POST', path: '/api/users/:id/temporary-password', access: ['admin'], body: { password: 'temporary password 1' } },

  // suppliers
  { method: 'GET', path: '/api/suppliers', access: 'signed-in' },
  { method: 'POST', path: '/api/suppliers', access: ['catalog_manager', 'admin'] },
  { method: 'GET', path: '/api/suppliers/:id', access: 'signed-in' },
  { method: 'PATCH', path: '/api/suppliers/:id', access: ['catalog_manager', 'admin'] },

  // catalog (mounts, import, export)
  { method: 'GET', path: '/api/mounts', access: 'signed-in' },
  { method: 'POST', path: '/api/mounts', access: ['catalog_manager', 'admin'] },
  { method: 'POST', path: '/api/mounts/import', access: ['catalog_manager', 'admin'] },
  { method: 'GET', path: '/api/mounts/imports', access: ['catalog_manager', 'admin'] },
  { method: 'GET', path: '/api/mounts/imports/:id/errors.csv', access: ['catalog_manager', 'admin'] },
  { method: 'GET', path: '/api/mounts/export.csv', access: 'signed-in' },
  { method: 'GET', path: '/api/mounts/:id', access: 'signed-in' },
  { method: 'PATCH', path: '/api/mounts/:id', access: ['catalog_manager', 'admin'] },
  { method: 'DELETE', path: '/api/mounts/:id', access: ['catalog_manager', 'admin'] },

  // projects (owner/admin checks for PATCH and DELETE are made by the service)
  { method: 'GET', path: '/api/projects', access: 'signed-in' },
  { method: 'POST', path: '/api/projects', access: ['engineer', 'admin'] },
  { method: 'GET', path: '/api/projects/:id', access: 'signed-in' },
  { method: 'PATCH', path: '/api/projects/:id', access: ['engineer', 'admin'] },
  { method: 'DELETE', path: '/api/projects/:id', access: ['engineer', 'admin'] },

  // designs (purchasers see released and superseded ones only; a draft is edited by its author or an admin)
  { method: 'GET', path: '/api/projects/:id/designs', access: 'signed-in' },
  { method: 'POST', path: '/api/projects/:id/designs', access: ['engineer', 'admin'] },
  { method: 'GET', path: '/api/designs/:id', access: 'signed-in' },
  { method: 'PUT', path: '/api/designs/:id', access: ['engineer', 'admin'] },
  { method: 'POST', path: '/api/designs/:id/selection', access: ['engineer', 'admin'] },

  // review (author/checker rules are made by the service)
  { method: 'POST', path: '/api/designs/:id/transitions', access: ['engineer', 'admin'], body: { to: 'in_review' } },
  { method: 'POST', path: '/api/designs/:id/revisions', access: ['engineer', 'admin'] },
  { method: 'GET', path: '/api/designs/:id/history', access: 'signed-in' },
  { method: 'GET', path: '/api/designs/:id/checkers', access: ['engineer', 'admin'] },
  { method: 'GET', path: '/api/my-work', access: 'signed-in' },

  // purchasing (exports: drafts only for their author or an admin; checked by the service)
  { method: 'GET', path: '/api/purchasing/designs', access: ['purchaser', 'admin'] },
  { method: 'GET', path: '/api/designs/:id/bom.csv', access: ['purchaser', 'engineer', 'admin'] },
  { method: 'GET', path: '/api/designs/:id/bom.xlsx', access: ['purchaser', 'engineer', 'admin'] },
  { method: 'GET', path: '/api/designs/:id/report.pdf', access: 'signed-in' },
  { method: 'POST', path: '/api/designs/:id/rfqs/preview', access: ['purchaser', 'admin'], body: { supplierId: 1 } },
  { method: 'POST', path: '/api/designs/:id/rfqs', access: ['purchaser', 'admin'], body: { supplierId: 1 } },
  { method: 'GET', path: '/api/designs/:id/rfqs', access: ['purchaser', 'admin'] },
  { method: 'PATCH', path: '/api/rfqs/:id', access: ['purchaser', 'admin'], body: { status: 'ordered' } },
  { method: 'POST', path: '/api/rfqs/:id/retry', access: ['purchaser', 'admin'] },

  // as-built verification (tap tests of released and superseded designs; reading follows the design's visibility)
  { method: 'GET', path: '/api/designs/:id/verifications', access: 'signed-in' },
  { method: 'POST', path: '/api/designs/:id/verifications', access: ['engineer', 'admin'], body: { kind: 'frf', quantity: 'receptance' } },

  // selection (stateless)
  { method: 'POST', path: '/api/selection', access: ['engineer', 'admin'] },
  { method: 'POST', path: '/api/selection/curves', access: ['engineer', 'admin'] },
];

/**
 * Registered routes that are not API endpoints and need no row: Swagger UI's own files.
 */
export const NOT_IN_MATRIX = (path: string): boolean => path.startsWith('/api/docs/');
