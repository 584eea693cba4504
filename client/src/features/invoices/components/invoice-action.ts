import type { InvoiceChange } from '../api/change-invoice';

/** Runs one change on the invoice, shows `done` when it worked and answers whether it did; errors show themselves. */
export type InvoiceAction = (change: InvoiceChange, done: string) => Promise<boolean>;
