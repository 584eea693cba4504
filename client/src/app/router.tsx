import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { PageLoader } from '@/components/page-loader';
import { RouteError } from '@/components/route-error';
import { paths } from '@/config/paths';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { RequireRole } from '@/features/auth/components/require-role';

// Every page is its own chunk, so the first download stays small.
export const routes: RouteObject[] = [
  {
    errorElement: <RouteError />,
    hydrateFallbackElement: <PageLoader />,
    children: [
      {
        path: paths.auth.signIn.path,
        lazy: async () => ({ Component: (await import('@/features/auth/routes/sign-in')).SignInRoute }),
      },
      {
        path: paths.auth.forgotPassword.path,
        lazy: async () => ({
          Component: (await import('@/features/auth/routes/forgot-password')).ForgotPasswordRoute,
        }),
      },
      {
        path: paths.auth.setPassword.path,
        lazy: async () => ({ Component: (await import('@/features/auth/routes/set-password')).SetPasswordRoute }),
      },
      {
        element: <RequireAuth />,
        children: [
          {
            lazy: async () => ({ Component: (await import('./layout/app-layout')).AppLayout }),
            children: [
              {
                index: true,
                lazy: async () => ({ Component: (await import('./routes/home/home')).HomeRoute }),
              },
              {
                element: <RequireRole roles={paths.edgeRecipes.roles} />,
                children: [
                  {
                    path: paths.edgeRecipes.path,
                    lazy: async () => ({
                      Component: (await import('@/features/edge-recipes/routes/edge-recipes')).EdgeRecipesRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.rates.roles} />,
                children: [
                  {
                    path: paths.rates.path,
                    lazy: async () => ({ Component: (await import('@/features/rates/routes/rates')).RatesRoute }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.team.roles} />,
                children: [
                  {
                    path: paths.team.path,
                    lazy: async () => ({ Component: (await import('@/features/users/routes/team')).TeamRoute }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.devOutbox.roles} />,
                children: [
                  {
                    path: paths.devOutbox.path,
                    lazy: async () => ({
                      Component: (await import('@/features/dev-outbox/routes/outbox')).OutboxRoute,
                    }),
                  },
                ],
              },
            ],
          },
        ],
      },
      {
        path: '*',
        lazy: async () => ({ Component: (await import('./routes/not-found')).NotFoundRoute }),
      },
    ],
  },
];

export function createAppRouter() {
  return createBrowserRouter(routes);
}
