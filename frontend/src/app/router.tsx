import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { paths } from '../config/paths';
import { homeRedirect, redirectIfSignedIn, requireUser } from '../lib/auth';
import { reportRoutes } from '../features/reports/routes/report-routes';
import { RootErrorBoundary, RootHydrateFallback, RootLayout } from './routes/root';
import { journalRoutes } from './routes/app/crews/journal/journal-routes';

/**
 * Route table. Each screen is a lazy module (its own chunk); guards that need the query cache are loaders
 * defined here. New crew sections (lakes, events, finds, catches, reports) go under the crew route's
 * children and into routes/app/crews/crew-sections.ts.
 */
export function createRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      id: 'root',
      Component: RootLayout,
      HydrateFallback: RootHydrateFallback,
      ErrorBoundary: RootErrorBoundary,
      children: [
        {
          path: paths.signIn.path,
          loader: redirectIfSignedIn(queryClient),
          lazy: () => import('./routes/auth/sign-in'),
        },
        {
          path: paths.signUp.path,
          loader: redirectIfSignedIn(queryClient),
          lazy: () => import('./routes/auth/sign-up'),
        },
        { path: paths.resetPassword.path, lazy: () => import('./routes/auth/reset-password') },
        { path: paths.invite.path, lazy: () => import('./routes/invite') },
        { path: paths.devOutbox.path, lazy: () => import('./routes/dev-outbox') },
        {
          id: 'signed-in',
          loader: requireUser(queryClient),
          lazy: () => import('./routes/app/shell'),
          children: [
            { index: true, loader: homeRedirect(queryClient) },
            { path: paths.newCrew.path, lazy: () => import('./routes/app/new-crew') },
            {
              path: paths.crew.path,
              lazy: () => import('./routes/app/crews/crew-layout'),
              children: [
                { index: true, lazy: () => import('./routes/app/crews/crew-home') },
                { path: paths.crewSettings.path, lazy: () => import('./routes/app/crews/crew-settings') },
                ...reportRoutes,
                ...journalRoutes,
              ],
            },
            { path: paths.account.path, lazy: () => import('./routes/app/account') },
            { path: paths.admin.path, lazy: () => import('./routes/app/admin') },
          ],
        },
        { path: '*', lazy: () => import('./routes/not-found') },
      ],
    },
  ];
}

/** The browser router of the running app. */
export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter(createRoutes(queryClient));
}
