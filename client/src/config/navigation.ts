import type { Role } from '@keenroute/shared';
import {
  IconBuildingBank,
  IconBuildingStore,
  IconCalendarWeek,
  IconChartBar,
  IconRoute,
  IconSun,
  IconTicket,
  IconCalendarDue,
  IconCalendarPlus,
  IconFileImport,
  IconFileInvoice,
  IconHome2,
  IconInbox,
  IconScissors,
  IconUsers,
  IconListNumbers,
  IconMailOpened,
  IconReceipt2,
  IconShieldCheck,
  IconUsersGroup,
  type Icon,
} from '@tabler/icons-react';
import { paths } from './paths';

export interface NavItem {
  label: string;
  href: string;
  icon: Icon;
  roles: readonly Role[];
  /** What the page lets a person do, for the home page. */
  summary: string;
  /** Shown under the label, e.g. to say a page is a development tool. */
  hint?: string;
}

// Later features add their pages here; only pages that exist are listed.
export const NAV_ITEMS: readonly NavItem[] = [
  {
    label: 'Home',
    href: paths.home.getHref(),
    icon: IconHome2,
    roles: paths.home.roles,
    summary: 'Your role, what Keenroute lets you do, and the cautions of the bench.',
  },
  {
    label: 'Today',
    href: paths.today.getHref(),
    icon: IconSun,
    roles: ['sharpener'],
    summary: 'Your route day today as a day sheet: stops in order, arrival windows, access notes and customers.',
  },
  {
    label: 'My week',
    href: paths.weekPlan.getHref(),
    icon: IconCalendarWeek,
    roles: ['sharpener'],
    summary: 'Your route days this week, with a calendar feed for your phone.',
  },
  {
    label: 'Week plan',
    href: paths.weekPlan.getHref(),
    icon: IconRoute,
    roles: ['owner', 'office'],
    summary: 'Plan the week’s route days, then drag stops between days and sharpeners; print the day sheets.',
  },
  {
    label: 'Tickets',
    href: paths.tickets.list.getHref(),
    icon: IconTicket,
    roles: paths.tickets.list.roles,
    summary: 'Each customer’s shears on a visit or drop-off: bench status per shear, price, hand back and payment.',
  },
  {
    label: 'Coming due',
    href: paths.comingDue.getHref(),
    icon: IconCalendarDue,
    roles: paths.comingDue.roles,
    summary: 'Stops by next due date, with days overdue, for planning the week.',
  },
  {
    label: 'Stops',
    href: paths.stops.list.getHref(),
    icon: IconBuildingStore,
    roles: paths.stops.list.roles,
    summary: 'Salons, barbershops and grooming shops on the route: address, hours, cadence and access notes.',
  },
  {
    label: 'Customers',
    href: paths.customers.list.getHref(),
    icon: IconUsers,
    roles: paths.customers.list.roles,
    summary: 'Stylists and groomers, the stop each works at, and their shears.',
  },
  {
    label: 'Shears',
    href: paths.shears.list.getHref(),
    icon: IconScissors,
    roles: paths.shears.list.roles,
    summary: 'Every registered shear by tag code, with its edge recipe, photos and service history.',
  },
  {
    label: 'Drop-offs',
    href: paths.bookings.list.getHref(),
    icon: IconInbox,
    roles: paths.bookings.list.roles,
    summary:
      'Shears booked online to be left at a stop for its route day, or mailed in, with the bench time they take.',
  },
  {
    label: 'Invoices',
    href: paths.invoices.list.getHref(),
    icon: IconFileInvoice,
    roles: paths.invoices.list.roles,
    summary:
      'Turn finished tickets into invoices per customer or per stop; send them, record payments, follow overdue.',
  },
  {
    label: 'Reports',
    href: paths.reports.stops.getHref(),
    icon: IconChartBar,
    roles: paths.reports.stops.roles,
    summary:
      'Revenue per stop, route day, sharpener and month; which stops pay for the drive, cadence kept, what is owed.',
  },
  {
    label: 'My shears',
    href: paths.shears.mine.getHref(),
    icon: IconScissors,
    roles: paths.shears.mine.roles,
    summary: 'Your shears, their tag codes and when each was last sharpened.',
  },
  {
    label: 'Book a drop-off',
    href: paths.bookings.book.getHref(),
    icon: IconCalendarPlus,
    roles: ['client'],
    summary: 'Leave your shears at your stop for its next route day, or mail them in, with an estimate of the price.',
  },
  {
    label: 'My invoices',
    href: paths.invoices.mine.getHref(),
    icon: IconFileInvoice,
    roles: paths.invoices.mine.roles,
    summary: 'Your invoices: what is owed, the PDF, the payments received, and paying online.',
  },
  {
    label: 'Import',
    href: paths.imports.getHref(),
    icon: IconFileImport,
    roles: paths.imports.roles,
    summary: 'Bring stops, customers and shears in from a spreadsheet (CSV), checked row by row first.',
  },
  {
    label: 'Edge recipes',
    href: paths.edgeRecipes.getHref(),
    icon: IconListNumbers,
    roles: paths.edgeRecipes.roles,
    summary:
      'The bench plan for every edge type and tool kind: abrasive steps, inside edge, finish, minutes and cautions.',
  },
  {
    label: 'Team',
    href: paths.team.getHref(),
    icon: IconUsersGroup,
    roles: paths.team.roles,
    summary: 'Invite sharpeners, office staff and clients, change their roles, deactivate those who have left.',
  },
  {
    label: 'Rates',
    href: paths.rates.getHref(),
    icon: IconReceipt2,
    // PRODUCT.md lists Rates under the owner; the office reads them too. Sharpeners reach the page by its address.
    roles: ['owner', 'office'],
    summary: 'The price list per pair, add-ons, trip charge and discounts, with a quote preview; the owner edits it.',
  },
  {
    label: 'Business profile',
    href: paths.businessProfile.getHref(),
    icon: IconBuildingBank,
    roles: paths.businessProfile.roles,
    summary: 'What every invoice says about the business: name, address, tax ID, logo, payment terms and reminders.',
  },
  {
    label: 'Audit log',
    href: paths.auditLog.getHref(),
    icon: IconShieldCheck,
    roles: paths.auditLog.roles,
    summary: 'Who signed in, changed a role or a price, voided or credited an invoice, and took money, and when.',
  },
  {
    label: 'Outbox',
    href: paths.devOutbox.getHref(),
    icon: IconMailOpened,
    roles: paths.devOutbox.roles,
    hint: 'E-mails caught locally',
    summary: 'Read the e-mails Keenroute has sent while the local mail catcher runs (development and demo only).',
  },
];

export function navItemsFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((item) => item.roles.includes(role));
}
