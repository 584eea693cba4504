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
        path: paths.bookings.manage.path,
        lazy: async () => ({
          Component: (await import('@/features/bookings/routes/manage-booking')).ManageBookingRoute,
        }),
      },
      {
        path: paths.pay.page.path,
        lazy: async () => ({ Component: (await import('@/features/payments/routes/pay')).PayRoute }),
      },
      {
        path: paths.pay.done.path,
        lazy: async () => ({ Component: (await import('@/features/payments/routes/pay-done')).PayDoneRoute }),
      },
      {
        lazy: async () => ({ Component: (await import('./layout/public-or-app-layout')).PublicOrAppLayout }),
        children: [
          {
            path: paths.bookings.book.path,
            lazy: async () => ({ Component: (await import('@/features/bookings/routes/book')).BookRoute }),
          },
        ],
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
                element: <RequireRole roles={paths.stops.list.roles} />,
                children: [
                  {
                    path: paths.stops.list.path,
                    lazy: async () => ({ Component: (await import('@/features/stops/routes/stops')).StopsRoute }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.stops.create.roles} />,
                children: [
                  {
                    path: paths.stops.create.path,
                    lazy: async () => ({
                      Component: (await import('@/features/stops/routes/stop-create')).StopCreateRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.stops.detail.roles} />,
                children: [
                  {
                    path: paths.stops.detail.path,
                    lazy: async () => ({
                      Component: (await import('@/features/stops/routes/stop-detail')).StopDetailRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.stops.edit.roles} />,
                children: [
                  {
                    path: paths.stops.edit.path,
                    lazy: async () => ({
                      Component: (await import('@/features/stops/routes/stop-edit')).StopEditRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.weekPlan.roles} />,
                children: [
                  {
                    path: paths.weekPlan.path,
                    lazy: async () => ({
                      Component: (await import('@/features/route-days/routes/week-plan')).WeekPlanRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.today.roles} />,
                children: [
                  {
                    path: paths.today.path,
                    lazy: async () => ({ Component: (await import('@/features/route-days/routes/today')).TodayRoute }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.routeDays.sheet.roles} />,
                children: [
                  {
                    path: paths.routeDays.sheet.path,
                    lazy: async () => ({
                      Component: (await import('@/features/route-days/routes/day-sheet')).DaySheetRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.routeDays.stopVisit.roles} />,
                children: [
                  {
                    path: paths.routeDays.stopVisit.path,
                    lazy: async () => ({
                      Component: (await import('@/features/tickets/routes/stop-visit')).StopVisitRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.tickets.list.roles} />,
                children: [
                  {
                    path: paths.tickets.list.path,
                    lazy: async () => ({ Component: (await import('@/features/tickets/routes/tickets')).TicketsRoute }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.tickets.detail.roles} />,
                children: [
                  {
                    path: paths.tickets.detail.path,
                    lazy: async () => ({ Component: (await import('@/features/tickets/routes/ticket')).TicketRoute }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.comingDue.roles} />,
                children: [
                  {
                    path: paths.comingDue.path,
                    lazy: async () => ({
                      Component: (await import('@/features/stops/routes/coming-due')).ComingDueRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.customers.list.roles} />,
                children: [
                  {
                    path: paths.customers.list.path,
                    lazy: async () => ({
                      Component: (await import('@/features/customers/routes/customers')).CustomersRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.customers.detail.roles} />,
                children: [
                  {
                    path: paths.customers.detail.path,
                    lazy: async () => ({
                      Component: (await import('@/features/customers/routes/customer-detail')).CustomerDetailRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.shears.list.roles} />,
                children: [
                  {
                    path: paths.shears.list.path,
                    lazy: async () => ({ Component: (await import('@/features/shears/routes/shears')).ShearsRoute }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.shears.detail.roles} />,
                children: [
                  {
                    path: paths.shears.detail.path,
                    lazy: async () => ({
                      Component: (await import('@/features/shears/routes/shear-detail')).ShearDetailRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.shears.mine.roles} />,
                children: [
                  {
                    path: paths.shears.mine.path,
                    lazy: async () => ({
                      Component: (await import('@/features/shears/routes/my-shears')).MyShearsRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.invoices.mine.roles} />,
                children: [
                  {
                    path: paths.invoices.mine.path,
                    lazy: async () => ({
                      Component: (await import('@/features/payments/routes/my-invoices')).MyInvoicesRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.bookings.list.roles} />,
                children: [
                  {
                    path: paths.bookings.list.path,
                    lazy: async () => ({
                      Component: (await import('@/features/bookings/routes/drop-offs')).DropOffsRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.invoices.list.roles} />,
                children: [
                  {
                    path: paths.invoices.list.path,
                    lazy: async () => ({
                      Component: (await import('@/features/invoices/routes/invoices')).InvoicesRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.invoices.create.roles} />,
                children: [
                  {
                    path: paths.invoices.create.path,
                    lazy: async () => ({
                      Component: (await import('@/features/invoices/routes/new-invoice')).NewInvoiceRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.invoices.detail.roles} />,
                children: [
                  {
                    path: paths.invoices.detail.path,
                    lazy: async () => ({
                      Component: (await import('@/features/invoices/routes/invoice')).InvoiceRoute,
                    }),
                  },
                ],
              },
              {
                // Every report is for owner and office alike.
                element: <RequireRole roles={paths.reports.stops.roles} />,
                children: [
                  {
                    path: paths.reports.stops.path,
                    lazy: async () => ({
                      Component: (await import('@/features/reports/routes/stops-report')).StopsReportRoute,
                    }),
                  },
                  {
                    path: paths.reports.revenue.path,
                    lazy: async () => ({
                      Component: (await import('@/features/reports/routes/revenue-report')).RevenueReportRoute,
                    }),
                  },
                  {
                    path: paths.reports.receivables.path,
                    lazy: async () => ({
                      Component: (await import('@/features/reports/routes/receivables-report')).ReceivablesReportRoute,
                    }),
                  },
                  {
                    path: paths.reports.cadence.path,
                    lazy: async () => ({
                      Component: (await import('@/features/reports/routes/cadence-report')).CadenceReportRoute,
                    }),
                  },
                  {
                    path: paths.reports.driveCost.path,
                    lazy: async () => ({
                      Component: (await import('@/features/reports/routes/drive-cost-report')).DriveCostReportRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.businessProfile.roles} />,
                children: [
                  {
                    path: paths.businessProfile.path,
                    lazy: async () => ({
                      Component: (await import('@/features/invoices/routes/business-profile')).BusinessProfileRoute,
                    }),
                  },
                ],
              },
              {
                element: <RequireRole roles={paths.imports.roles} />,
                children: [
                  {
                    path: paths.imports.path,
                    lazy: async () => ({ Component: (await import('@/features/imports/routes/imports')).ImportsRoute }),
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
                element: <RequireRole roles={paths.auditLog.roles} />,
                children: [
                  {
                    path: paths.auditLog.path,
                    lazy: async () => ({
                      Component: (await import('@/features/audit/routes/audit-log')).AuditLogRoute,
                    }),
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
