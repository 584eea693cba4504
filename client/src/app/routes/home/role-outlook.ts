import type { Role } from '@keenroute/shared';

/** The pages each role will get next (PRODUCT.md, "What each role sees first"); none of them exists yet. */
export const ROLE_OUTLOOK: Record<Role, string[]> = {
  owner: [
    'Stop earnings: revenue per stop, per route day and per sharpener',
    'Business settings',
    'Everything the office sees: week plan, stops, customers, tickets and invoices',
  ],
  office: ['Week plan and stops coming due', 'Stops, customers and their shears', 'Drop-offs, tickets and invoices'],
  sharpener: [
    'Today: the day sheet on your phone, stops in order with arrival times',
    'My week and the stops on my days',
    'Tickets: shears, edge recipes and payments taken on site',
  ],
  client: [
    'My shears and their history',
    'Book a drop-off for the next route day, or mail-in',
    'My invoices, paid online',
  ],
};
