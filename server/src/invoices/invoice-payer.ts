import type { BillingMode } from '@keenroute/shared';
import type { BillTo } from './entities/invoice.entity';

/** Who pays for a ticket: the stop when it is billed as a whole (a salon paying for its stylists), else the customer. */
export interface Payer {
  billTo: BillTo;
  customerId: string | null;
  stopId: string | null;
}

export function payerOf(ticket: { customerId: string; stopId: string | null }, stopBilling: BillingMode | null): Payer {
  return stopBilling === 'stop' && ticket.stopId
    ? { billTo: 'stop', customerId: null, stopId: ticket.stopId }
    : { billTo: 'customer', customerId: ticket.customerId, stopId: null };
}

export const payerKey = (payer: Payer) => `${payer.billTo}:${payer.customerId ?? payer.stopId}`;

/** The address block of a stop, line by line, as the invoice prints it. */
export function addressLines(place: {
  street: string;
  city: string;
  region: string;
  postalCode: string;
  country: string;
}): string[] {
  const cityLine = [place.city, [place.region, place.postalCode].filter(Boolean).join(' ')].filter(Boolean).join(', ');
  return [place.street, cityLine, place.country].map((line) => line.trim()).filter(Boolean);
}
