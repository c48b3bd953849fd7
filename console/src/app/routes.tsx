import type { ComponentType } from 'react';
import type { RouteObject } from 'react-router-dom';
import { NotFoundPage } from '@/app/not-found-page';
import { AppShell } from '@/app/shell/app-shell';
import { PageLoading } from '@/components/page-loading';
import { RouteError } from '@/components/route-error';
import { paths } from '@/config/paths';

// Every page is its own chunk: a route's code is fetched the first time it is visited.
function lazyPage<Module>(load: () => Promise<Module>, pick: (module: Module) => ComponentType) {
  return async () => ({ Component: pick(await load()) });
}

const shellPages: RouteObject[] = [
  {
    index: true,
    lazy: lazyPage(() => import('@/features/overview/components/overview-page'), (m) => m.OverviewPage),
  },
  {
    path: paths.playground,
    lazy: lazyPage(() => import('@/features/playground/components/playground-page'), (m) => m.PlaygroundPage),
  },
  {
    path: paths.datasets,
    lazy: lazyPage(() => import('@/features/datasets/components/datasets-page'), (m) => m.DatasetsPage),
  },
  {
    path: paths.apiKeys,
    lazy: lazyPage(() => import('@/features/keys/components/api-keys-page'), (m) => m.ApiKeysPage),
  },
  {
    path: paths.team,
    lazy: lazyPage(() => import('@/features/team/components/team-page'), (m) => m.TeamPage),
  },
  {
    path: paths.usage,
    lazy: lazyPage(() => import('@/features/usage/components/usage-page'), (m) => m.UsagePage),
  },
  {
    path: paths.billing,
    lazy: lazyPage(() => import('@/features/billing/components/billing-page'), (m) => m.BillingPage),
  },
  { path: '*', Component: NotFoundPage },
];

export const routes: RouteObject[] = [
  {
    path: paths.signIn,
    HydrateFallback: PageLoading,
    ErrorBoundary: RouteError,
    lazy: lazyPage(() => import('@/features/auth/components/sign-in-page'), (m) => m.SignInPage),
  },
  {
    path: paths.overview,
    Component: AppShell,
    HydrateFallback: PageLoading,
    ErrorBoundary: RouteError,
    children: [
      {
        // Errors inside a page keep the shell (navigation, health) on screen.
        ErrorBoundary: RouteError,
        children: shellPages,
      },
    ],
  },
];
