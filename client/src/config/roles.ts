import type { Role } from '@keenroute/shared';

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  office: 'Office',
  sharpener: 'Sharpener',
  client: 'Client',
};

/** One line per role, in the words of the product brief, for pickers and the home page. */
export const ROLE_SUMMARIES: Record<Role, string> = {
  owner: 'Runs the business: everything, including rates, users and the business profile.',
  office: 'Runs the office: stops, customers, bookings, invoices, payments and the team.',
  sharpener: 'Works route days on the road: day sheets, tickets, shears and payments on site.',
  client: 'A stylist, groomer or shop manager: books drop-offs, sees their own shears and invoices.',
};
