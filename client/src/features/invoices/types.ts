// The invoice API's shapes, as the contract for issue 7 sets them (server/src/invoices and /documents).

export const INVOICE_STATUSES = ['draft', 'sent', 'part-paid', 'paid', 'void'] as const;
export type InvoiceStatus = (typeof INVOICE_STATUSES)[number];

export type BillTo = 'customer' | 'stop';

export const INVOICE_PAYMENT_METHODS = ['cash', 'cheque', 'card-terminal', 'online'] as const;
export type InvoicePaymentMethod = (typeof INVOICE_PAYMENT_METHODS)[number];

/** What the office records by hand; online payments arrive from the payment service only. */
export const MANUAL_PAYMENT_METHODS = ['cash', 'cheque', 'card-terminal'] as const;
export type ManualPaymentMethod = (typeof MANUAL_PAYMENT_METHODS)[number];

export const REFUND_METHODS = ['none', 'cash', 'cheque', 'card-terminal', 'online'] as const;
export type RefundMethod = (typeof REFUND_METHODS)[number];

/** A row of GET /api/invoices. */
export interface InvoiceSummary {
  id: string;
  /** KR-2026-0001 once issued; a draft has none. */
  number: string | null;
  status: InvoiceStatus;
  overdue: boolean;
  daysOverdue: number;
  billTo: BillTo;
  billToName: string;
  issueDate: string | null;
  dueDate: string | null;
  currency: string;
  totalCents: number;
  balanceCents: number;
  createdAt: string;
}

export interface TaxGroup {
  taxRateBp: number;
  taxableCents: number;
  taxCents: number;
}

export interface InvoiceLine {
  id: string;
  ticketId: string | null;
  position: number;
  kind: 'shear' | 'adjustment';
  description: string;
  amountCents: number;
  taxable: boolean;
  taxRateBp: number;
}

export interface InvoiceTicket {
  id: string;
  visitDay: string;
  stopName: string | null;
  customerName: string;
  totalCents: number;
}

export interface InvoicePayment {
  id: string;
  method: InvoicePaymentMethod;
  amountCents: number;
  reference: string | null;
  recordedAt: string;
  /** Taken at the stop on one of its tickets, before the invoice. */
  onSite: boolean;
}

export interface CreditNote {
  id: string;
  number: string;
  amountCents: number;
  reason: string;
  refundMethod: RefundMethod;
  createdAt: string;
}

/** GET /api/invoices/:id. */
export interface Invoice extends InvoiceSummary {
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
  taxGroups: TaxGroup[];
  paidCents: number;
  creditedCents: number;
  notes: string | null;
  voidReason: string | null;
  voidedAt: string | null;
  sentAt: string | null;
  version: number;
  lines: InvoiceLine[];
  tickets: InvoiceTicket[];
  payments: InvoicePayment[];
  creditNotes: CreditNote[];
  /** The public pay link while something is owed on an issued invoice; null otherwise. */
  payUrl: string | null;
}

export interface InvoicePage {
  items: InvoiceSummary[];
  total: number;
  page: number;
  pageSize: number;
}

/** The list's filters; 'overdue' is derived on the server, so it is its own flag rather than a status. */
export interface InvoiceListParams {
  status?: InvoiceStatus;
  overdue?: boolean;
  q?: string;
  page?: number;
  pageSize?: number;
}

/** GET /api/invoices/ready: finished tickets left for an invoice, grouped by who pays. */
export interface ReadyTicket {
  id: string;
  visitDay: string;
  stopName: string | null;
  customerName: string;
  totalCents: number;
  /** Paid on site already; it counts against the invoice once issued. */
  paidCents: number;
}

export interface ReadyGroup {
  billTo: BillTo;
  customerId: string | null;
  stopId: string | null;
  name: string;
  email: string | null;
  currency: string;
  tickets: ReadyTicket[];
  totalCents: number;
  paidCents: number;
}

/** A discount asked for as a share (basis points) or as an amount; the server refuses both at once. */
export interface DiscountInput {
  discountBp?: number;
  discountCents?: number;
}

export interface CreateInvoiceInput extends DiscountInput {
  ticketIds: string[];
  notes?: string;
}

export interface UpdateDraftInput extends DiscountInput {
  version: number;
  notes?: string;
}

export interface RecordPaymentInput {
  method: ManualPaymentMethod;
  amountCents: number;
  reference?: string;
  sendReceipt?: boolean;
}

export interface CreditNoteInput {
  amountCents: number;
  reason: string;
  refundMethod: RefundMethod;
}

/** A row of GET /api/invoices/:id/mails, the send log. */
export interface InvoiceMail {
  id: string;
  kind: 'invoice' | 'reminder' | 'receipt' | 'statement';
  toEmail: string;
  subject: string;
  /** 'queued' until the mail queue has tried it; the error then says why a try failed. */
  status: 'queued' | 'sent' | 'failed';
  error: string | null;
  createdAt: string;
}

/** GET/PUT /api/business-profile: who the invoices come from. */
export interface BusinessProfile {
  name: string;
  street: string;
  city: string;
  region: string;
  postalCode: string;
  country: string;
  phone: string;
  email: string;
  website: string;
  taxId: string;
  invoiceFooter: string;
  paymentTermsDays: number;
  /** Days after the due date on which an unpaid invoice gets a reminder, ascending. */
  reminderDays: number[];
  logoUrl: string | null;
}

export type BusinessProfileInput = Omit<BusinessProfile, 'logoUrl'>;
