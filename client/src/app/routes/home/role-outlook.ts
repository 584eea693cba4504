import type { Role } from '@keenroute/shared';

/** The pages each role will get next (PRODUCT.md, "What each role sees first"); none of them exists yet. */
export const ROLE_OUTLOOK: Record<Role, string[]> = {
  // Reports (stop earnings), Business profile, the week plan, tickets and invoices are all here now.
  owner: [],
  // The week plan, tickets and invoices are here now.
  office: [],
  // Today, My week and Tickets are here now.
  sharpener: [],
  // My shears, Book a drop-off and My invoices are all here now.
  client: [],
};
