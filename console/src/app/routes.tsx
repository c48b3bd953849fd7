import type { ComponentType } from 'react';
import type { RouteObject } from 'react-router-dom';
import { HomeRedirect } from '@/app/home-redirect';
import { NotFoundPage } from '@/app/not-found-page';
import { RequireSession } from '@/app/require-session';
import { TeamLayout } from '@/app/team-layout';
import { PageLoading } from '@/components/page-loading';
import { RouteError } from '@/components/route-error';
import { paths, teamSections } from '@/config/paths';

// Every page is its own chunk: a route's code is fetched the first time it is visited.
function lazyPage<Module>(load: () => Promise<Module>, pick: (module: Module) => ComponentType) {
  return async () => ({ Component: pick(await load()) });
}

const teamPages: RouteObject[] = [
  {
    index: true,
    lazy: lazyPage(() => import('@/features/overview/components/overview-page'), (m) => m.OverviewPage),
  },
  {
    path: teamSections.playground,
    lazy: lazyPage(() => import('@/features/playground/components/playground-page'), (m) => m.PlaygroundPage),
  },
  {
    path: teamSections.datasets,
    lazy: lazyPage(() => import('@/features/datasets/components/datasets-page'), (m) => m.DatasetsPage),
  },
  {
    path: teamSections.apiKeys,
    lazy: lazyPage(() => import('@/features/keys/components/api-keys-page'), (m) => m.ApiKeysPage),
  },
  {
    path: teamSections.members,
    lazy: lazyPage(() => import('@/features/team/components/team-page'), (m) => m.TeamPage),
  },
  {
    path: teamSections.usage,
    lazy: lazyPage(() => import('@/features/usage/components/usage-page'), (m) => m.UsagePage),
  },
  {
    path: teamSections.billing,
    lazy: lazyPage(() => import('@/features/billing/components/billing-page'), (m) => m.BillingPage),
  },
  { path: '*', Component: NotFoundPage },
];

export const routes: RouteObject[] = [
  {
    HydrateFallback: PageLoading,
    ErrorBoundary: RouteError,
    children: [
      {
        path: paths.signIn,
        lazy: lazyPage(() => import('@/features/auth/components/sign-in-page'), (m) => m.SignInPage),
      },
      {
        path: paths.resetPassword,
        lazy: lazyPage(() => import('@/features/auth/components/reset-password-page'), (m) => m.ResetPasswordPage),
      },
      {
        path: paths.acceptInvitation,
        lazy: lazyPage(() => import('@/features/auth/components/accept-invitation-page'), (m) => m.AcceptInvitationPage),
      },
      {
        Component: RequireSession,
        children: [
          { index: true, Component: HomeRedirect },
          {
            path: paths.team,
            Component: TeamLayout,
            children: [
              {
                // Errors inside a page keep the shell (navigation, health) on screen.
                ErrorBoundary: RouteError,
                children: teamPages,
              },
            ],
          },
          { path: '*', Component: NotFoundPage },
        ],
      },
    ],
  },
];
