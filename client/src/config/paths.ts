import { ROLES, STAFF_ROLES, USER_ADMIN_ROLES, type Role } from '@keenroute/shared';

/** Only same-site paths may be a place to return to after signing in. */
export function safeRedirect(target: string | null | undefined): string {
  if (!target || !target.startsWith('/') || target.startsWith('//')) return '/';
  return target;
}

const OWNER_ONLY: readonly Role[] = ['owner'];
const ADMIN_ROLES: readonly Role[] = ['owner', 'office'];
const ADMIN_AND_SHARPENER: readonly Role[] = STAFF_ROLES;
const CLIENT_ONLY: readonly Role[] = ['client'];
// Those who work route days on the road: a sharpener, and an owner who sharpens too.
const ROUTE_WORKERS: readonly Role[] = ['owner', 'sharpener'];

export const paths = {
  home: { path: '/', roles: ROLES, getHref: () => '/' },
  auth: {
    signIn: {
      path: '/sign-in',
      getHref: (redirectTo?: string) =>
        redirectTo && safeRedirect(redirectTo) !== '/'
          ? `/sign-in?redirectTo=${encodeURIComponent(redirectTo)}`
          : '/sign-in',
    },
    forgotPassword: {
      path: '/forgot-password',
      getHref: (email?: string) => (email ? `/forgot-password?email=${encodeURIComponent(email)}` : '/forgot-password'),
    },
    setPassword: {
      path: '/set-password',
      getHref: (token: string) => `/set-password?token=${encodeURIComponent(token)}`,
    },
  },
  edgeRecipes: { path: '/edge-recipes', roles: STAFF_ROLES, getHref: () => '/edge-recipes' },
  // Every staff role may read the rates and quote (as the API allows); the page lets only an owner change them.
  rates: { path: '/rates', roles: STAFF_ROLES, getHref: () => '/rates' },
  stops: {
    list: { path: '/stops', roles: STAFF_ROLES, getHref: () => '/stops' },
    create: { path: '/stops/new', roles: ADMIN_ROLES, getHref: () => '/stops/new' },
    detail: { path: '/stops/:stopId', roles: STAFF_ROLES, getHref: (id: string) => `/stops/${id}` },
    edit: { path: '/stops/:stopId/edit', roles: ADMIN_ROLES, getHref: (id: string) => `/stops/${id}/edit` },
  },
  // Week plan for owner and office, My week for a sharpener: one page, shaped by the role.
  weekPlan: { path: '/week', roles: STAFF_ROLES, getHref: () => '/week' },
  today: { path: '/today', roles: ROUTE_WORKERS, getHref: () => '/today' },
  routeDays: {
    sheet: {
      path: '/route-days/:routeDayId/sheet',
      roles: STAFF_ROLES,
      getHref: (id: string) => `/route-days/${encodeURIComponent(id)}/sheet`,
    },
    // One stop of a route day as the sharpener works it: its customers, bookings and tickets.
    stopVisit: {
      path: '/route-days/:routeDayId/stops/:stopId',
      roles: STAFF_ROLES,
      getHref: (routeDayId: string, stopId: string) =>
        `/route-days/${encodeURIComponent(routeDayId)}/stops/${encodeURIComponent(stopId)}`,
    },
  },
  tickets: {
    list: { path: '/tickets', roles: STAFF_ROLES, getHref: () => '/tickets' },
    detail: {
      path: '/tickets/:ticketId',
      roles: STAFF_ROLES,
      getHref: (id: string) => `/tickets/${encodeURIComponent(id)}`,
    },
  },
  comingDue: { path: '/coming-due', roles: ADMIN_AND_SHARPENER, getHref: () => '/coming-due' },
  customers: {
    list: { path: '/customers', roles: STAFF_ROLES, getHref: () => '/customers' },
    detail: { path: '/customers/:customerId', roles: ROLES, getHref: (id: string) => `/customers/${id}` },
  },
  shears: {
    list: { path: '/shears', roles: STAFF_ROLES, getHref: () => '/shears' },
    detail: { path: '/shears/:shearId', roles: ROLES, getHref: (id: string) => `/shears/${id}` },
    mine: { path: '/my-shears', roles: CLIENT_ONLY, getHref: () => '/my-shears' },
  },
  bookings: {
    // Public: a visit notice links here with its stop and day; a signed-in person sees it inside the app.
    book: {
      path: '/book',
      getHref: (stopId?: string, day?: string) => {
        const query = new URLSearchParams();
        if (stopId) query.set('stop', stopId);
        if (stopId && day) query.set('day', day);
        const search = query.toString();
        return search ? `/book?${search}` : '/book';
      },
    },
    // Public: the private link of the confirmation e-mail.
    manage: { path: '/drop-off/:token', getHref: (token: string) => `/drop-off/${encodeURIComponent(token)}` },
    list: { path: '/drop-offs', roles: STAFF_ROLES, getHref: () => '/drop-offs' },
  },
  invoices: {
    list: { path: '/invoices', roles: ADMIN_ROLES, getHref: () => '/invoices' },
    // The finished tickets left for an invoice, grouped by who pays: the office makes drafts from here.
    create: { path: '/invoices/new', roles: ADMIN_ROLES, getHref: () => '/invoices/new' },
    detail: {
      path: '/invoices/:invoiceId',
      roles: ROLES,
      getHref: (id: string) => `/invoices/${encodeURIComponent(id)}`,
    },
    mine: { path: '/my-invoices', roles: CLIENT_ONLY, getHref: () => '/my-invoices' },
  },
  // Stop earnings and the other revenue reports: the owner's, and the office's who plans the weeks.
  reports: {
    stops: { path: '/reports', roles: ADMIN_ROLES, getHref: (search = '') => `/reports${search}` },
    revenue: { path: '/reports/revenue', roles: ADMIN_ROLES, getHref: (search = '') => `/reports/revenue${search}` },
    receivables: {
      path: '/reports/receivables',
      roles: ADMIN_ROLES,
      getHref: (search = '') => `/reports/receivables${search}`,
    },
    cadence: { path: '/reports/cadence', roles: ADMIN_ROLES, getHref: (search = '') => `/reports/cadence${search}` },
    driveCost: {
      path: '/reports/drive-cost',
      roles: ADMIN_ROLES,
      getHref: (search = '') => `/reports/drive-cost${search}`,
    },
  },
  businessProfile: { path: '/settings/business', roles: ADMIN_ROLES, getHref: () => '/settings/business' },
  // Public: the private pay link printed on the invoice and in its e-mail; done is where the checkout returns.
  pay: {
    page: { path: '/pay/:token', getHref: (token: string) => `/pay/${encodeURIComponent(token)}` },
    done: { path: '/pay/:token/done', getHref: (token: string) => `/pay/${encodeURIComponent(token)}/done` },
  },
  imports: { path: '/imports', roles: ADMIN_ROLES, getHref: () => '/imports' },
  team: { path: '/team', roles: USER_ADMIN_ROLES, getHref: () => '/team' },
  // Who signed in, changed roles and prices, voided and took money: the owner's alone, as the API allows.
  auditLog: { path: '/audit', roles: OWNER_ONLY, getHref: () => '/audit' },
  devOutbox: { path: '/dev/outbox', roles: OWNER_ONLY, getHref: () => '/dev/outbox' },
} as const;
