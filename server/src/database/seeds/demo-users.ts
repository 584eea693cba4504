import type { Role } from '@keenroute/shared';

/**
 * The demo scenario: "Larkhaven Shear Route", an invented sharpening business in an invented town.
 * Every person here is made up; the sign-ins are for trying Keenroute and must be changed before real use.
 */
export const DEMO_PASSWORD = 'keenroute-demo';

export const DEMO_USERS: ReadonlyArray<{ email: string; name: string; role: Role }> = [
  { email: 'owner@demo.keenroute.test', name: 'Dana Whitlow (demo owner)', role: 'owner' },
  { email: 'office@demo.keenroute.test', name: 'Priya Castell (demo office)', role: 'office' },
  { email: 'sharpener@demo.keenroute.test', name: 'Tomas Reyne (demo sharpener)', role: 'sharpener' },
  { email: 'client@demo.keenroute.test', name: 'Jo Marlow (demo groomer)', role: 'client' },
];
