// The invoice shapes this feature reads, as the issue 7 contract sets them (server/src/payments/online and
// server/src/invoices). Kept here rather than shared with the office pages, so each feature stands on its own.

export type InvoiceStatus = 'draft' | 'sent' | 'part-paid' | 'paid' | 'void';

export type PaymentMethod = 'cash' | 'cheque' | 'card-terminal' | 'online';

export type RefundMethod = 'none' | PaymentMethod;

/** GET /api/public/invoices/:token: what the holder of the private pay link may see. */
export interface PublicInvoice {
  number: string;
  status: InvoiceStatus;
  overdue: boolean;
  billToName: string;
  issueDate: string;
  dueDate: string | null;
  currency: string;
  totalCents: number;
  paidCents: number;
  creditedCents: number;
  balanceCents: number;
  lines: { description: string; amountCents: number }[];
  taxCents: number;
  business: { name: string; email: string | null; phone: string | null };
  /** '/api/public/invoices/<token>/pdf': opens without signing in. */
  pdfUrl: string;
  canPayOnline: boolean;
}

/** GET /api/public/invoices/:token/status: what the page after the checkout polls. */
export interface PaymentStatusPoll {
  status: InvoiceStatus;
  balanceCents: number;
  paidCents: number;
}

/** POST /api/public/invoices/:token/checkout. */
export interface CheckoutStarted {
  url: string;
}

/** A row of GET /api/invoices; a client gets theirs only. */
export interface InvoiceSummary {
  id: string;
  number: string | null;
  status: InvoiceStatus;
  overdue: boolean;
  daysOverdue: number;
  billTo: 'customer' | 'stop';
  billToName: string;
  issueDate: string | null;
  dueDate: string | null;
  currency: string;
  totalCents: number;
  balanceCents: number;
  createdAt: string;
}

export interface InvoicePage {
  items: InvoiceSummary[];
  total: number;
  page: number;
  pageSize: number;
}

export interface InvoicePayment {
  id: string;
  method: PaymentMethod;
  amountCents: number;
  reference: string | null;
  recordedAt: string;
  /** Taken at the stop on one of the invoice's tickets, before the invoice was made. */
  onSite: boolean;
}

/** GET /api/invoices/:id. */
export interface InvoiceDetail extends InvoiceSummary {
  customer: { id: string; name: string } | null;
  stop: { id: string; name: string } | null;
  billToEmail: string | null;
  billToAddress: string;
  termsDays: number;
  discountBp: number;
  discountCents: number;
  linesCents: number;
  discountTotalCents: number;
  subtotalCents: number;
  taxCents: number;
  taxGroups: { taxRateBp: number; taxableCents: number; taxCents: number }[];
  paidCents: number;
  creditedCents: number;
  notes: string;
  voidReason: string | null;
  voidedAt: string | null;
  sentAt: string | null;
  version: number;
  lines: {
    id: string;
    ticketId: string | null;
    position: number;
    kind: 'shear' | 'adjustment';
    description: string;
    amountCents: number;
    taxable: boolean;
    taxRateBp: number;
  }[];
  tickets: { id: string; visitDay: string; stopName: string | null; customerName: string; totalCents: number }[];
  payments: InvoicePayment[];
  creditNotes: {
    id: string;
    number: string;
    amountCents: number;
    reason: string;
    refundMethod: RefundMethod;
    createdAt: string;
  }[];
  /** The private pay link, set while an issued invoice still has something owed. */
  payUrl: string | null;
}
