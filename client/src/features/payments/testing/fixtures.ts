// Invented demo invoices for the component tests (no real business or person).
import type { InvoiceDetail, InvoiceSummary, PaymentStatusPoll, PublicInvoice } from '../types';

export const TOKEN = 'pay-tok-7f3a9c';

export function publicInvoice(overrides: Partial<PublicInvoice> = {}): PublicInvoice {
  return {
    number: 'KR-2026-0007',
    status: 'sent',
    overdue: false,
    billToName: 'Pine Street Salon',
    issueDate: '2026-03-02',
    dueDate: '2026-03-16',
    currency: 'USD',
    // Lines 3000 + 1800 = 4800, 10% discount 480 → 4320, tax 8.25% of 4320 = 356.4 → 356 (half-up), total 4676.
    lines: [
      { description: 'Convex straight shear, 6.5 in (KR-000123)', amountCents: 3000 },
      { description: 'Thinning shear (KR-000045)', amountCents: 1800 },
    ],
    taxCents: 356,
    totalCents: 4676,
    paidCents: 0,
    creditedCents: 0,
    balanceCents: 4676,
    business: { name: 'Teal Edge Sharpening (demo)', email: 'office@demo.keenroute.test', phone: '+1 541 555 0142' },
    pdfUrl: `/api/public/invoices/${TOKEN}/pdf`,
    canPayOnline: true,
    ...overrides,
  };
}

export function statusPoll(overrides: Partial<PaymentStatusPoll> = {}): PaymentStatusPoll {
  return { status: 'sent', balanceCents: 4676, paidCents: 0, ...overrides };
}

export function invoiceSummary(overrides: Partial<InvoiceSummary> = {}): InvoiceSummary {
  return {
    id: 'inv-7',
    number: 'KR-2026-0007',
    status: 'sent',
    overdue: false,
    daysOverdue: 0,
    billTo: 'customer',
    billToName: 'Casey Groomer',
    issueDate: '2026-03-02',
    dueDate: '2026-03-16',
    currency: 'USD',
    totalCents: 4676,
    balanceCents: 4676,
    createdAt: '2026-03-02T15:00:00.000Z',
    ...overrides,
  };
}

export function invoiceDetail(overrides: Partial<InvoiceDetail> = {}): InvoiceDetail {
  const summary = invoiceSummary(overrides);
  return {
    ...summary,
    customer: { id: 'c-casey', name: 'Casey Groomer' },
    stop: null,
    billToEmail: 'client@demo.keenroute.test',
    billToAddress: '12 Pine Street, Riverton',
    termsDays: 14,
    discountBp: 1000,
    discountCents: 0,
    linesCents: 4800,
    discountTotalCents: 480,
    subtotalCents: 4320,
    taxCents: 356,
    taxGroups: [{ taxRateBp: 825, taxableCents: 4320, taxCents: 356 }],
    paidCents: summary.totalCents - summary.balanceCents,
    creditedCents: 0,
    notes: '',
    voidReason: null,
    voidedAt: null,
    sentAt: '2026-03-02T15:05:00.000Z',
    version: 3,
    lines: [
      {
        id: 'l-1',
        ticketId: 't-1',
        position: 1,
        kind: 'shear',
        description: 'Convex straight shear, 6.5 in (KR-000123)',
        amountCents: 3000,
        taxable: true,
        taxRateBp: 825,
      },
      {
        id: 'l-2',
        ticketId: 't-1',
        position: 2,
        kind: 'shear',
        description: 'Thinning shear (KR-000045)',
        amountCents: 1800,
        taxable: true,
        taxRateBp: 825,
      },
    ],
    tickets: [
      {
        id: 't-1',
        visitDay: '2026-02-24',
        stopName: 'Pine Street Salon',
        customerName: 'Casey Groomer',
        totalCents: 4676,
      },
    ],
    payments: [],
    creditNotes: [],
    payUrl: summary.balanceCents > 0 && summary.status !== 'void' ? `http://keenroute.test/pay/${TOKEN}` : null,
    ...overrides,
  };
}
