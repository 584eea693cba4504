import type { Role } from '@keenroute/shared';

/** The pages each role will get next (PRODUCT.md, "What each role sees first"); none of them exists yet. */
export const ROLE_OUTLOOK: Record<Role, string[]> = {
  owner: [
    'Stop earnings: revenue per stop, per route day and per sharpener',
    'Business settings',
    'The week plan, tickets and invoices the office will see',
  ],
  office: ['Week plan: route days proposed from the stops coming due', 'Tickets and invoices'],
  sharpener: [
    'Today: the day sheet on your phone, stops in order with arrival times',
    'My week: the route days planned for you',
    'Tickets: shears, edge recipes and payments taken on site',
  ],
  // My shears, Book a drop-off and My invoices are all here now.
  client: [],
};
