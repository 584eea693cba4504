import type { Role } from '@keenroute/shared';

/** Owner and office make, issue, send, credit and void invoices (as the API allows); the server decides. */
export function canManageInvoices(role: Role): boolean {
  return role === 'owner' || role === 'office';
}

/** A sharpener may record a payment on an invoice of their own route days; the server checks which. */
export function canRecordPayment(role: Role): boolean {
  return role === 'owner' || role === 'office' || role === 'sharpener';
}

/** A statement of account: the office for anyone, a client for their own customer record (the server checks whose). */
export function canGetCustomerStatement(role: Role): boolean {
  return role === 'owner' || role === 'office' || role === 'client';
}
