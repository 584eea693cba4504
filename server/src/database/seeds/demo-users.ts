import type { Role } from '@keenroute/shared';

/**
 * The demo scenario: "Larkhaven Shear Route", an invented sharpening business in an invented town.
 * Every person here is made up; the sign-ins are for trying Keenroute and must be changed before real use.
 */
export const DEMO_PASSWORD = 'keenroute-demo';

/** The demo sign-ins the registry seed refers to (the sharpener's stops, Jo's customer record, Rin's shop). */
export const DEMO_EMAILS = {
  owner: 'owner@demo.keenroute.test',
  office: 'office@demo.keenroute.test',
  sharpener: 'sharpener@demo.keenroute.test',
  client: 'client@demo.keenroute.test',
  shopManager: 'manager@demo.keenroute.test',
} as const;

export const DEMO_USERS: ReadonlyArray<{ email: string; name: string; role: Role }> = [
  { email: DEMO_EMAILS.owner, name: 'Dana Whitlow (demo owner)', role: 'owner' },
  { email: DEMO_EMAILS.office, name: 'Priya Castell (demo office)', role: 'office' },
  { email: DEMO_EMAILS.sharpener, name: 'Tomas Reyne (demo sharpener)', role: 'sharpener' },
  { email: DEMO_EMAILS.client, name: 'Jo Marlow (demo groomer)', role: 'client' },
  // A client account that manages one grooming shop (stops.manager_user_id): sees every customer there.
  { email: DEMO_EMAILS.shopManager, name: 'Rin Calloway (demo shop manager)', role: 'client' },
];
