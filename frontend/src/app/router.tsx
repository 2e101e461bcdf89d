import type { ComponentType } from 'react';
import { createBrowserRouter, type RouteObject } from 'react-router';
import { RequireRole, RequireSession } from './guards.js';
import { AppShell } from './shell/app-shell.js';
import { RouteErrorBoundary } from './route-error-boundary.js';
import type { Role } from '@linkloom/shared';

type ScreenModule = { default: ComponentType };

/** A lazily loaded screen with its own error boundary and, optionally, a minimum role. */
function screen(path: string | undefined, load: () => Promise<ScreenModule>, minRole?: Role): RouteObject {
  return {
    ...(path === undefined ? { index: true } : { path }),
    errorElement: <RouteErrorBoundary />,
    lazy: async () => {
      const { default: Screen } = await load();
      if (!minRole) return { Component: Screen };
      return {
        Component: () => (
          <RequireRole minimum={minRole}>
            <Screen />
          </RequireRole>
        ),
      };
    },
  } as RouteObject;
}

export const routes: RouteObject[] = [
  screen('/sign-in', () => import('../features/auth/routes/sign-in-route.js')),
  // Opened from an e-mail, signed in or not: the signed token in the link is all it needs.
  screen('/unsubscribe/:token', () => import('../features/notifications/routes/unsubscribe-route.js')),
  {
    path: '/',
    element: (
      <RequireSession>
        <AppShell />
      </RequireSession>
    ),
    errorElement: <RouteErrorBoundary />,
    children: [
      screen(undefined, () => import('../features/doc-sets/routes/doc-sets-route.js')),
      screen('doc-sets/:docSetId', () => import('../features/doc-sets/routes/overview-route.js')),
      screen('doc-sets/:docSetId/pages', () => import('../features/pages/routes/page-explorer-route.js')),
      screen('doc-sets/:docSetId/page', () => import('../features/pages/routes/page-detail-route.js')),
      screen('doc-sets/:docSetId/findings/:view?', () => import('../features/findings/routes/findings-route.js')),
      screen('doc-sets/:docSetId/map', () => import('../features/link-map/routes/link-map-route.js')),
      screen('doc-sets/:docSetId/search', () => import('../features/search/routes/search-route.js')),
      screen('doc-sets/:docSetId/settings', () => import('../features/doc-sets/routes/settings-route.js')),
      screen('doc-sets/:docSetId/runs', () => import('../features/runs/routes/runs-route.js')),
      screen('doc-sets/:docSetId/pruning', () => import('../features/pruning/routes/pruning-route.js'), 'writer'),
      screen('tasks', () => import('../features/tasks/routes/tasks-route.js')),
      screen('admin/users', () => import('../features/users/routes/users-route.js'), 'admin'),
      screen('admin/mail', () => import('../features/mail/routes/mail-route.js'), 'admin'),
      screen('admin/schedule', () => import('../features/schedule/routes/schedule-route.js'), 'editor'),
      screen('account', () => import('../features/auth/routes/account-route.js')),
      screen('account/notifications', () => import('../features/notifications/routes/notifications-route.js')),
      screen('*', () => import('./not-found-route.js')),
    ],
  },
];

export function createAppRouter() {
  return createBrowserRouter(routes);
}
