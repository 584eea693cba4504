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
  imports: { path: '/imports', roles: ADMIN_ROLES, getHref: () => '/imports' },
  team: { path: '/team', roles: USER_ADMIN_ROLES, getHref: () => '/team' },
  devOutbox: { path: '/dev/outbox', roles: OWNER_ONLY, getHref: () => '/dev/outbox' },
} as const;
