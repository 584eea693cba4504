import type { BusinessProfile } from '../../src/invoices/entities/business-profile.entity';
import type { Invoice } from '../../src/invoices/entities/invoice.entity';
import type { InvoiceLine } from '../../src/invoices/entities/invoice-line.entity';
import type { InvoiceDocument } from '../../src/invoices/documents/invoice-document';

const PAY_URL =
  'http://127.0.0.1:3000/pay/0b7e6f1c-3f55-4c1e-9a51-7d2a9e0c1b2d.Qm9ndXNfc2lnbmF0dXJlX2Zvcl9hX3Rlc3RfX19fX19fX18';

/** An invented demo invoice: two shears at 8.25 %, a 10 % discount, part-paid. Amounts follow from the lines. */
export function demoDocument(overrides: Partial<Invoice> = {}, logo: Buffer | null = null): InvoiceDocument {
  const lines = [
    { description: 'Convex 6.5 in straight shear, Wren Talbot (demo)', amountCents: 4500 },
    { description: 'Bevel 7 in thinning shear, Wren Talbot (demo)', amountCents: 3800 },
    { description: 'Trip charge, Pine Street Salon (demo)', amountCents: 1200 },
  ].map(
    (line, position) =>
      ({ ...line, id: `line-${position}`, position, kind: 'shear', taxable: true, taxRateBp: 825 }) as InvoiceLine,
  );
  const linesCents = 9500;
  const discount = 950; // 10 % of 95.00
  const subtotal = linesCents - discount;
  const tax = Math.round((subtotal * 825) / 10_000); // 8550 × 8.25 % = 705.375 → 705
  const invoice = {
    id: '0b7e6f1c-3f55-4c1e-9a51-7d2a9e0c1b2d',
    number: 'KR-2026-0007',
    status: 'part-paid',
    billTo: 'customer',
    billToName: 'Wren Talbot (demo)',
    billToEmail: 'wren@demo.keenroute.test',
    billToAddress: 'c/o Pine Street Salon (demo)\n12 Invoice Row\nLarkhaven',
    currency: 'USD',
    issueDate: '2026-12-03',
    dueDate: '2026-12-17',
    termsDays: 14,
    discountBp: 1000,
    discountCents: 0,
    linesCents,
    discountTotalCents: discount,
    subtotalCents: subtotal,
    taxCents: tax,
    totalCents: subtotal + tax,
    taxGroups: [{ taxRateBp: 825, taxableCents: subtotal, taxCents: tax }],
    paidCents: 2000,
    creditedCents: 0,
    notes: 'Left at the front desk.',
    voidReason: null,
    ...overrides,
  } as Invoice;
  const profile = {
    name: 'Larkhaven Edge Works (demo)',
    street: '8 Whetstone Lane',
    city: 'Larkhaven',
    region: 'LS',
    postalCode: '55901',
    phone: '555-0142',
    email: 'office@edgeworks.demo.test',
    website: '',
    taxId: '41-7788123',
    invoiceFooter: 'Thank you for keeping your shears sharp.',
  } as BusinessProfile;
  const balance = invoice.status === 'void' ? 0 : invoice.totalCents - invoice.paidCents - invoice.creditedCents;
  return {
    invoice,
    lines,
    payments: [],
    creditNotes: [],
    profile,
    logo,
    balanceCents: Math.max(0, balance),
    payUrl: balance > 0 && invoice.status !== 'void' ? PAY_URL : null,
  };
}
