import { ROLES, STAFF_ROLES, USER_ADMIN_ROLES, type Role } from '@keenroute/shared';

/** Only same-site paths may be a place to return to after signing in. */
export function safeRedirect(target: string | null | undefined): string {
  if (!target || !target.startsWith('/') || target.startsWith('//')) return '/';
  return target;
}

const OWNER_ONLY: readonly Role[] = ['owner'];

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
  team: { path: '/team', roles: USER_ADMIN_ROLES, getHref: () => '/team' },
  devOutbox: { path: '/dev/outbox', roles: OWNER_ONLY, getHref: () => '/dev/outbox' },
} as const;
